import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';
import { resetSessionForTests } from '@/lib/session/session';

// Fluent pages render slowly in jsdom on a busy two-core machine; wait up to 5 s for what a
// person would see, rather than failing at testing-library's 1 s default.
configure({ asyncUtilTimeout: 5000 });

// jsdom has no layout, so no scrolling; the router's scroll restoration calls it on every navigation.
window.scrollTo = () => {};

// jsdom measures nothing, so it has no ResizeObserver; Fluent's MessageBar observes its own width.
class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}
window.ResizeObserver ??= ResizeObserverStub;

// jsdom lays nothing out: every offsetParent is null and the body measures 0 × 0. Fluent's focus
// helper (tabster) then takes every element for hidden, so an opened dialog cannot move focus into
// its first field, and it may stay aria-hidden. Give it the little layout it asks about.
Object.defineProperty(HTMLElement.prototype, 'offsetParent', {
  configurable: true,
  get(this: HTMLElement) {
    return this.parentElement;
  },
});
HTMLBodyElement.prototype.getBoundingClientRect = () => new DOMRect(0, 0, 1280, 800);

// Without vitest globals, Testing Library cannot register its own cleanup. The session lives in
// memory for the whole page, as in a browser tab, so each test starts as a freshly opened one.
afterEach(() => {
  cleanup();
  resetSessionForTests();
});
