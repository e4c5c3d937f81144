import { ROLES, type Role } from './roles';

/**
 * Who may do what, by capability. The server's route guard and the web app's navigation read
 * this one table, so a button is never shown for something the server would refuse (and the
 * server never trusts the button).
 */
export const POLICIES = {
  /** Read the network structure: regions and chapters (in scope). */
  'network.read': [...ROLES],
  /** Set up regions, chapters, partner agencies, campaigns, blanket sizes and settings. */
  'network.manage': ['network_admin'],
  /** Read parcel receipts and their scans (in scope); grant writers see aggregates only. */
  'receipts.read': [
    'network_admin',
    'national_staff',
    'regional_coordinator',
    'chapter_lead',
    'auditor',
  ],
  /** Log, correct and import parcel receipts (chapter leads for their own chapter). */
  'receipts.write': ['network_admin', 'national_staff', 'chapter_lead'],
  /**
   * See senders' names, e-mails and addresses (BRIEF §2): the receiving chapter, national staff,
   * admins and auditors. Regional coordinators and grant writers never do.
   */
  'senders.read': ['network_admin', 'national_staff', 'chapter_lead', 'auditor'],
  /** Erase a sender's personal data while keeping the counts. */
  'senders.erase': ['network_admin'],
  /** Read monthly tallies and their revisions (in scope); grant writers see aggregates only. */
  'tallies.read': [
    'network_admin',
    'national_staff',
    'regional_coordinator',
    'chapter_lead',
    'auditor',
  ],
  /** Draft, edit, submit and amend monthly tallies (chapter leads for their own chapter). */
  'tallies.write': ['network_admin', 'national_staff', 'chapter_lead'],
  /** Approve or return submitted tallies (coordinators for their own region). */
  'tallies.review': ['network_admin', 'national_staff', 'regional_coordinator'],
  /** Read report snapshots, dashboards and campaign progress (in scope). */
  'reports.read': [...ROLES],
  /**
   * Export a table the person can read (receipts, tallies, review queue, snapshots) with the
   * same filters and scope; each table also needs its own read policy.
   */
  'exports.tables': [...ROLES],
  /** Build the impact pack workbook for funding applications (aggregates only). */
  'exports.impact-pack': ['network_admin', 'national_staff', 'grant_writer'],
  /** See the background jobs, their progress and failures, and retry a failed one. */
  'jobs.manage': ['network_admin', 'national_staff'],
  /** Invite people, change their role or scope, deactivate them. */
  'people.manage': ['network_admin'],
  /** Read the e-mails the development mail catcher has captured. */
  'outbox.read': ['network_admin'],
  /** Read the audit log. */
  'audit.read': ['network_admin', 'auditor'],
  /**
   * Plan and draw audit samples and record their worksheets: the auditor's only writes (BRIEF §2,
   * "read-only" everywhere else).
   */
  'audit.sample': ['auditor'],
  /** Recompute the audit log's hash chain and see the first broken link, if any. */
  'audit.verify': ['network_admin', 'auditor'],
  /** Read audit findings and the responses to them. */
  'findings.read': ['network_admin', 'national_staff', 'auditor'],
  /** Write findings (linked to traces and samples): the auditor's other write. */
  'findings.write': ['auditor'],
  /** Respond to a finding on the network's behalf. */
  'findings.respond': ['network_admin', 'national_staff'],
  /** Follow a report figure to its tallies, receipts and scans (in scope). */
  'trace.read': [
    'network_admin',
    'national_staff',
    'regional_coordinator',
    'chapter_lead',
    'auditor',
  ],
  /** See the system status page (database, queues). */
  'system.read': ['network_admin', 'national_staff'],
} as const satisfies Record<string, readonly Role[]>;

export type Policy = keyof typeof POLICIES;

export function rolesFor(policy: Policy): readonly Role[] {
  return POLICIES[policy];
}

export function can(role: Role | null | undefined, policy: Policy): boolean {
  return !!role && (POLICIES[policy] as readonly Role[]).includes(role);
}
