/**
 * GET /api/health: is the database up, and which version runs.
 * Tests: tests/server/api.test.ts, outage.test.ts, start.test.ts (and the role matrix, the fuzzer).
 */
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { HealthResponse } from '../../../shared/api-types';
import { databaseIsUp } from '../../db/sequelize';
import type { Allow } from '../../policies';

export function healthRoutes(allow: Allow, sequelize: Sequelize, version: string): Router {
  const r = Router();
  r.get('/health', allow('health.read'), async (_req, res) => {
    const up = await databaseIsUp(sequelize);
    const payload: HealthResponse = { status: up ? 'ok' : 'degraded', db: up ? 'up' : 'down', version };
    res.set('Cache-Control', 'no-store').status(up ? 200 : 503).json(payload);
  });
  return r;
}
