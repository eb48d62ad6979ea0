import express from 'express';
import request from 'supertest';
import { createApp } from '../app';
import { startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe("a path that does not decode is the caller's mistake", () => {
  it.each(['/api/clients/%E0%A4%A', '/api/inquiries/%', '/portal/proposals/%zz', '/clients/%C0'])(
    '%s answers 400 problem+json',
    async (path) => {
      // A stand-in for the server-rendered apps: reaching it with a bad path would be the bug.
      const rendered = jest.fn((_req: express.Request, res: express.Response) => res.send('page'));
      const app = createApp(t.ctx, { admin: rendered, portal: rendered });
      const res = await request(app).get(path);
      expect(res.status).toBe(400);
      expect(res.headers['content-type']).toContain('application/problem+json');
      expect(res.body.errors).toEqual([{ field: '(path)', message: 'Not valid percent-encoding.' }]);
      expect(rendered).not.toHaveBeenCalled();
    },
  );
});
