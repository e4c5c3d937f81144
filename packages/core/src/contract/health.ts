/** What `GET /api/health` answers: one entry per backing service. */

export type ServiceState = 'up' | 'down';

export interface DatabaseHealth {
  status: ServiceState;
  /** Server version string, e.g. "10.11.14-MariaDB-0+deb12u2", when up. */
  version?: string;
  error?: string;
}

export interface QueueHealth {
  status: ServiceState;
  /** Bull queues and their job counts, when up. */
  queues?: Array<{
    name: string;
    waiting: number;
    active: number;
    failed: number;
    delayed: number;
  }>;
  error?: string;
}

export interface HealthReport {
  status: 'ok' | 'degraded';
  version: string;
  uptimeSeconds: number;
  database: DatabaseHealth;
  queue: QueueHealth;
}
