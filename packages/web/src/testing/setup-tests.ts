import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

// jsdom has no layout, so no scrolling; the router's scroll restoration calls it on every navigation.
window.scrollTo = () => {};

// jsdom measures nothing, so it has no ResizeObserver; Fluent's MessageBar observes its own width.
class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}
window.ResizeObserver ??= ResizeObserverStub;

// Without vitest globals, Testing Library cannot register its own cleanup.
afterEach(() => {
  cleanup();
});
