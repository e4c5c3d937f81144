import { randomUUID } from 'node:crypto';
import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { ModulesContainer } from '@nestjs/core';
import { POLICIES, ROLES, type Policy, type Role } from '@tallyloom/core';
import {
  PUBLIC_ROUTE,
  ROUTE_POLICY,
  SIGNED_IN,
} from '../../services/api/src/common/access/access.decorators';
import { receiptImportRouteParams } from './fixtures/receipt-imports';
import { receiptRouteParams } from './fixtures/receipts';
import { tallyRouteParams } from './fixtures/tallies';
import { aRegion } from './support/network-builders';
import { aUser, signedIn } from './support/people-builders';
import { networkSetupRouteParams } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

// Signing in six roles and building every route's fixtures outgrows jest's 5 s default under load;
// walking every route × role took over 30 s beside other suites on two cores.
jest.setTimeout(120_000);

/**
 * Routes a role's policy admits but whose whole-network view is not theirs: they get a 403 that
 * points to their own dashboard instead.
 */
const SENT_TO_OWN_DASHBOARD: Record<string, readonly Role[]> = {
  'GET /api/dashboards/network': ['regional_coordinator', 'chapter_lead'],
};

interface RouteEntry {
  method: string;
  path: string;
  policy: Policy | typeof SIGNED_IN | 'public' | undefined;
}

/** Reads every route from Nest's own metadata, so a route added later is covered without anyone listing it. */
function routeTable(testApp: TestApp): RouteEntry[] {
  const entries: RouteEntry[] = [];
  for (const module of testApp.app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) {
      const controller = wrapper.metatype as (new (...args: unknown[]) => object) | null;
      if (!controller) continue;
      const base = String(Reflect.getMetadata(PATH_METADATA, controller) ?? '');
      const prototype = controller.prototype as Record<string, unknown>;
      for (const name of Object.getOwnPropertyNames(prototype)) {
        const handler = prototype[name];
        if (name === 'constructor' || typeof handler !== 'function') continue;
        const method = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
        if (method === undefined) continue;
        const sub = String(Reflect.getMetadata(PATH_METADATA, handler) ?? '');
        const isPublic = (Reflect.getMetadata(PUBLIC_ROUTE, handler) ??
          Reflect.getMetadata(PUBLIC_ROUTE, controller)) as boolean | undefined;
        const policy = (Reflect.getMetadata(ROUTE_POLICY, handler) ??
          Reflect.getMetadata(ROUTE_POLICY, controller)) as RouteEntry['policy'];
        const path = `/api/${[base, sub].filter((p) => p && p !== '/').join('/')}`.replace(
          /\/+/g,
          '/',
        );
        entries.push({ method: RequestMethod[method], path, policy: isPublic ? 'public' : policy });
      }
    }
  }
  return entries;
}

describe('every route × every role × in and out of scope', () => {
  let testApp: TestApp;
  let routes: RouteEntry[];
  const tokens = new Map<Role, string>();
  /** For each path parameter route: an id inside the scoped roles' scope and one outside it. */
  let params: Record<string, { inScope: string; outOfScope: string }>;

  beforeAll(async () => {
    testApp = await startTestApp();
    routes = routeTable(testApp);
    const home = await aRegion()
      .named('Route Home')
      .withChapter('Route Mill')
      .withChapter('Route Ford')
      .build(testApp.app);
    const away = await aRegion().named('Route Away').withChapter('Route Far').build(testApp.app);
    for (const role of ROLES) {
      const scope =
        role === 'regional_coordinator'
          ? { regionId: home.region.id }
          : role === 'chapter_lead'
            ? { chapterId: home.chapters[0].id }
            : {};
      tokens.set(role, (await signedIn(testApp, role, scope)).token);
    }
    const invitedHere = await aUser()
      .withRole('chapter_lead')
      .inChapter(home.chapters[0].id)
      .invited()
      .build(testApp.app);
    const invitedAway = await aUser()
      .withRole('chapter_lead')
      .inChapter(away.chapters[0].id)
      .invited()
      .build(testApp.app);
    params = {
      '/api/regions/:id': { inScope: String(home.region.id), outOfScope: String(away.region.id) },
      '/api/chapters/:id': {
        inScope: String(home.chapters[0].id),
        outOfScope: String(away.chapters[0].id),
      },
      // People are managed network-wide by admins only: "scope" there is the role itself.
      '/api/users/:id': {
        inScope: String(invitedHere.user.id),
        outOfScope: String(invitedAway.user.id),
      },
      '/api/users/:id/resend-invite': {
        inScope: String(invitedHere.user.id),
        outOfScope: String(invitedAway.user.id),
      },
      '/api/auth/links/:token': { inScope: 'not-a-real-token', outOfScope: 'not-a-real-token' },
      // Queues are network-wide (admins and staff only); the job id stays unknown, so a 404.
      '/api/jobs/:queue/:jobId/retry': { inScope: 'reminders', outOfScope: 'reminders' },
      ...(await receiptRouteParams(
        testApp,
        tokens.get('network_admin')!,
        home.chapters[0].id,
        away.chapters[0].id,
      )),
      ...(await receiptImportRouteParams(
        testApp,
        tokens.get('network_admin')!,
        home.chapters[0].id,
        away.chapters[0].id,
      )),
      ...(await tallyRouteParams(
        testApp,
        tokens.get('network_admin')!,
        home.chapters[0].id,
        away.chapters[0].id,
      )),
      ...(await networkSetupRouteParams(testApp.app, {
        homeRegionId: home.region.id,
        homeChapterId: home.chapters[0].id,
        awayRegionId: away.region.id,
        awayChapterId: away.chapters[0].id,
      })),
      '/api/dashboards/regions/:id': {
        inScope: String(home.region.id),
        outOfScope: String(away.region.id),
      },
      '/api/dashboards/chapters/:id': {
        inScope: String(home.chapters[0].id),
        outOfScope: String(away.chapters[0].id),
      },
    };
    // Exports are their requester's own: an id that is not yours is not found, like an unknown one.
    const someoneElsesExport = { inScope: randomUUID(), outOfScope: randomUUID() };
    params['/api/exports/:id'] = someoneElsesExport;
    params['/api/exports/:id/file'] = someoneElsesExport;
    // The campaign dashboards scope campaigns exactly as the campaigns routes do.
    params['/api/dashboards/campaigns/:id'] = params['/api/campaigns/:id'];
    // Audit samples are network-wide: admins and auditors read them, auditors alone write, and no
    // scoped role reaches them. An unknown sample stands in for both (a 404 to those admitted).
    const noSuchSample = '987654321';
    params['/api/samples/:id'] = { inScope: noSuchSample, outOfScope: noSuchSample };
    params['/api/samples/:id/items/:itemId'] = {
      inScope: `${noSuchSample}/items/1?`,
      outOfScope: `${noSuchSample}/items/1?`,
    };
    params['/api/samples/:id/items/:itemId/attachment'] = {
      inScope: `${noSuchSample}/items/1/attachment?`,
      outOfScope: `${noSuchSample}/items/1/attachment?`,
    };
    // Findings are network-wide, read by admins, staff and auditors only; an unknown one stands in.
    for (const path of [
      '/api/findings/:id',
      '/api/findings/:id/responses',
      '/api/findings/:id/close',
    ])
      params[path] = { inScope: noSuchSample, outOfScope: noSuchSample };
    // A trace reference names its scope: a month of the home chapter, and of the away one.
    params['/api/trace/:reference'] = {
      inScope: `chapter:${home.chapters[0].id}:2024-01`,
      outOfScope: `chapter:${away.chapters[0].id}:2024-01`,
    };
  });
  afterAll(() => testApp.close());

  function send(route: RouteEntry, path: string, token?: string) {
    const http = testApp.http();
    const call =
      route.method === 'GET'
        ? http.get(path)
        : route.method === 'POST'
          ? http.post(path).send({})
          : route.method === 'PATCH'
            ? http.patch(path).send({})
            : route.method === 'PUT'
              ? http.put(path).send({})
              : http.delete(path);
    return token ? call.set('Authorization', `Bearer ${token}`) : call;
  }

  function fill(route: RouteEntry, which: 'inScope' | 'outOfScope'): string {
    if (!route.path.includes(':')) return route.path;
    const known = params[route.path];
    if (!known)
      throw new Error(
        `${route.method} ${route.path} has a path parameter: add in- and out-of-scope values to this test`,
      );
    return route.path.replace(/:[A-Za-z]+/, known[which]);
  }

  it('finds the routes, and every one declares a policy that exists', () => {
    expect(routes.length).toBeGreaterThanOrEqual(15);
    const undeclared = routes.filter((r) => !r.policy).map((r) => `${r.method} ${r.path}`);
    expect(undeclared).toEqual([]);
    const unknown = routes.filter(
      (r) => r.policy && r.policy !== 'public' && r.policy !== SIGNED_IN && !(r.policy in POLICIES),
    );
    expect(unknown).toEqual([]);
  });

  it('refuses every non-public route without a token (401)', async () => {
    for (const route of routes.filter((r) => r.policy !== 'public')) {
      const response = await send(route, fill(route, 'inScope'));
      expect(`${route.method} ${route.path} → ${response.status}`).toBe(
        `${route.method} ${route.path} → 401`,
      );
    }
  });

  it('refuses roles without the policy (403) and admits roles with it, in scope', async () => {
    for (const route of routes.filter((r) => r.policy !== 'public')) {
      for (const role of ROLES) {
        const allowed =
          route.policy === SIGNED_IN ||
          (POLICIES[route.policy as Policy] as readonly Role[]).includes(role);
        const response = await send(route, fill(route, 'inScope'), tokens.get(role));
        const label = `${role}: ${route.method} ${route.path} → ${response.status}`;
        if (allowed && SENT_TO_OWN_DASHBOARD[`${route.method} ${route.path}`]?.includes(role))
          expect(`${label}: ${(response.body as { message?: string }).message}`).toMatch(
            /→ 403: Your dashboard is your (region|chapter)'s: \/api\/dashboards\//,
          );
        else if (allowed)
          expect([401, 403, 500].includes(response.status) ? label : 'admitted').toBe('admitted');
        else expect(label).toBe(`${role}: ${route.method} ${route.path} → 403`);
      }
    }
  });

  it('hides rows outside the scope of regional roles (404), for every route with an id', async () => {
    for (const route of routes.filter((r) => r.policy !== 'public' && r.path.includes(':'))) {
      for (const role of ['regional_coordinator', 'chapter_lead'] as const) {
        const allowed =
          route.policy === SIGNED_IN ||
          (POLICIES[route.policy as Policy] as readonly Role[]).includes(role);
        if (!allowed) continue;
        const response = await send(route, fill(route, 'outOfScope'), tokens.get(role));
        expect(`${role}: ${route.method} ${route.path} → ${response.status}`).toBe(
          `${role}: ${route.method} ${route.path} → 404`,
        );
      }
    }
  });
});
