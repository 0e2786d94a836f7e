/** `GET /api/health` (503 with the same body while the database is down). */
export interface HealthResponse {
  status: 'ok' | 'degraded';
  db: 'up' | 'down';
  version: string;
}
