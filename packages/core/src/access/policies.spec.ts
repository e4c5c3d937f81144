import { can, POLICIES, rolesFor, type Policy } from './policies';
import { isRole, type Role } from './roles';

/** The six roles of BRIEF §2, written out here rather than read from ROLES. */
const SIX_ROLES: Role[] = [
  'network_admin',
  'national_staff',
  'regional_coordinator',
  'chapter_lead',
  'grant_writer',
  'auditor',
];

describe('access policies', () => {
  it.each<[Role | null | undefined, Policy, boolean]>([
    ['network_admin', 'people.manage', true],
    ['national_staff', 'people.manage', false],
    ['auditor', 'people.manage', false],
    ['auditor', 'audit.read', true],
    ['network_admin', 'audit.read', true],
    ['grant_writer', 'audit.read', false],
    ['chapter_lead', 'audit.read', false],
    ['national_staff', 'system.read', true],
    ['regional_coordinator', 'system.read', false],
    ['network_admin', 'outbox.read', true],
    ['auditor', 'outbox.read', false],
    ['chapter_lead', 'network.read', true],
    ['grant_writer', 'network.read', true],
    [null, 'network.read', false],
    [undefined, 'network.read', false],
  ])('can(%s, %s) is %s', (role, policy, expected) => {
    expect(can(role, policy)).toBe(expected);
  });

  it('refuses a role name that is not one of the six', () => {
    expect(can('network_owner' as Role, 'network.read')).toBe(false);
  });

  it('lists only known roles in every policy, each once', () => {
    for (const [policy, roles] of Object.entries(POLICIES)) {
      expect({ policy, unknown: roles.filter((role) => !isRole(role)) }).toEqual({
        policy,
        unknown: [],
      });
      expect(new Set(roles).size).toBe(roles.length);
    }
  });

  it('lets only network admins manage people', () => {
    // BRIEF §2: the network admin invites people and gives roles.
    expect(rolesFor('people.manage')).toEqual(['network_admin']);
    expect(SIX_ROLES.filter((role) => can(role, 'people.manage'))).toEqual(['network_admin']);
  });

  it('lets all six roles read the network structure', () => {
    expect([...rolesFor('network.read')].sort()).toEqual([...SIX_ROLES].sort());
  });

  it('lets admins and auditors, and no one else, read the audit log', () => {
    // BRIEF §2: auditors see everything, read-only.
    expect(SIX_ROLES.filter((role) => can(role, 'audit.read'))).toEqual([
      'network_admin',
      'auditor',
    ]);
  });
});
