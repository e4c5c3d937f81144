/** Every Bull queue the product uses; later issues add their jobs to these. */
export enum QueueName {
  /** Rebuilds report snapshots after tallies change. */
  Reports = 'reports',
  /** E-mails chapter leads whose monthly tally is missing near its due day. */
  Reminders = 'reminders',
  /** Writes spreadsheet exports to files, and removes them when their links expire. */
  Exports = 'exports',
  /** Seals new audit entries onto the hash chain, and verifies the chain every night. */
  AuditLog = 'audit-log',
}

export const ALL_QUEUES: QueueName[] = Object.values(QueueName);
