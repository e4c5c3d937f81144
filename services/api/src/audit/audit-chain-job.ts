export enum AuditChainJob {
  /** Puts pending entries on the chain (after writes, and every minute). */
  Seal = 'seal',
  /** Seals, recomputes the whole chain and records the result (nightly). */
  Verify = 'verify',
}

export const SEAL_EVERY_MINUTE_CRON = '* * * * *';
export const SEAL_EVERY_MINUTE_JOB_ID = 'audit-chain-seal';
export const NIGHTLY_VERIFY_CRON = '30 2 * * *';
export const NIGHTLY_VERIFY_JOB_ID = 'audit-chain-verify';

/** Both jobs are safe to repeat: sealing takes only unsealed rows, verifying only reads. */
export const AUDIT_CHAIN_JOB_OPTIONS = {
  attempts: 3,
  backoff: { type: 'exponential', delay: 10_000 },
  removeOnComplete: 200,
  removeOnFail: 200,
} as const;
