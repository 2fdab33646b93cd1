import express from 'express';
import { describe, expect, it } from 'vitest';
import { routeInventory } from './route-inventory';

// Expected keys follow Express 5's own mounting rules (expressjs.com, "express.Router" and "app.use" path joining).
describe('route inventory', () => {
  it('finds routes on routers of any name, nested mounts and a router mounted at the root', () => {
    const app = express();
    const api = express.Router();
    const people = express.Router();
    people.get('/', (_req, res) => res.end());
    people.patch('/:id', (_req, res) => res.end());
    const places = express.Router();
    places
      .route('/sites')
      .get((_req, res) => res.end())
      .post((_req, res) => res.end());
    api.use('/people', people);
    api.use('/', places);
    api.get('/health', (_req, res) => res.end());
    api.use((_req, res) => res.end());
    app.use(express.json());
    app.use('/api', api);
    app.get('/{*splat}', (_req, res) => res.end());
    expect(routeInventory(app).sort()).toEqual([
      'GET /api/health',
      'GET /api/people',
      'GET /api/sites',
      'PATCH /api/people/:id',
      'POST /api/sites',
    ]);
  });
});
