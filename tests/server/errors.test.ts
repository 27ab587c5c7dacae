import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorMiddleware } from '../../server/errors/middleware';
import { silent, startTestServer, type TestServer } from './helpers';

describe('errors and headers', () => {
  it('when a route throws an unexpected error, then the client gets a bare 500 with no stack or internal text', async () => {
    const app = express();
    app.get('/boom', () => {
      throw new Error('SQLITE_CORRUPT: secret path /var/data/x.sqlite');
    });
    app.use(errorMiddleware(silent));
    const res = await request(app).get('/boom');
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: { code: 'internal', message: 'something went wrong on the server; the problem was logged' } });
    expect(res.text).not.toContain('SQLITE');
    expect(res.text).not.toContain(' at ');
  });

  describe('CORS', () => {
    let s: TestServer;
    beforeAll(async () => {
      s = await startTestServer({ env: { APP_ORIGIN: 'http://127.0.0.1:8080' } });
    });
    afterAll(() => s.close());

    it("when the app's own origin asks, then CORS allows it; any other origin gets no allow header", async () => {
      const own = await request(s.app).options('/api/library').set('Origin', 'http://127.0.0.1:8080').set('Access-Control-Request-Method', 'GET');
      expect(own.headers['access-control-allow-origin']).toBe('http://127.0.0.1:8080');
      const other = await request(s.app).options('/api/library').set('Origin', 'http://evil.example').set('Access-Control-Request-Method', 'GET');
      expect(other.headers['access-control-allow-origin']).toBeUndefined();
    });
  });
});
