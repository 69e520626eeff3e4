export interface HealthView {
  status: 'ok' | 'degraded';
  database: 'up' | 'down';
  version: string;
  /** Server time, ISO 8601. */
  time: string;
  demoMode: boolean;
}
