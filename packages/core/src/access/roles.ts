/** The six roles of BRIEF §2 and the reach of each. */

export const ROLES = [
  'network_admin',
  'national_staff',
  'regional_coordinator',
  'chapter_lead',
  'grant_writer',
  'auditor',
] as const;

export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  network_admin: 'Network admin',
  national_staff: 'National staff',
  regional_coordinator: 'Regional coordinator',
  chapter_lead: 'Chapter lead',
  grant_writer: 'Grant writer',
  auditor: 'Auditor',
};

/** What a person of the role is limited to: the whole network, one region or one chapter. */
export type ScopeKind = 'network' | 'region' | 'chapter';

export const ROLE_SCOPE: Record<Role, ScopeKind> = {
  network_admin: 'network',
  national_staff: 'network',
  regional_coordinator: 'region',
  chapter_lead: 'chapter',
  grant_writer: 'network',
  auditor: 'network',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
