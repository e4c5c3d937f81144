import { SetMetadata } from '@nestjs/common';
import type { Policy } from '@tallyloom/core';

export const PUBLIC_ROUTE = 'tallyloom:public';
export const ROUTE_POLICY = 'tallyloom:policy';
export const SIGNED_IN = 'signed-in' as const;

/** Anyone may call this route, signed in or not. */
export const Public = () => SetMetadata(PUBLIC_ROUTE, true);

/**
 * Only people whose role holds `policy` (see POLICIES in packages/core) may call this route;
 * `'signed-in'` admits every role. A route with neither this nor @Public() is refused.
 */
export const Allow = (policy: Policy | typeof SIGNED_IN) => SetMetadata(ROUTE_POLICY, policy);
