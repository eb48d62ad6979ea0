import express from 'express';
import request from 'supertest';
import { loadConfig } from '../config';
import { testDatabaseUrls } from '../testing/test-env';
import { API_CSP, securityHeadersFor } from './security';

const settings = { ...testDatabaseUrls(), SESSION_SECRET: 'security-headers-spec-secret-long-enough-1' };

function app(env: Record<string, string> = {}) {
  const a = express();
  a.set('etag', false);
  a.use(securityHeadersFor(loadConfig({ ...settings, ...env })));
  a.get('/api/thing', (_req, res) => res.json({ ok: true }));
  a.get('/page', (_req, res) => res.type('html').send(`<!doctype html><p>${String(res.locals['cspNonce'])}</p>`));
  return a;
}

/** The headers of an answer that helmet and the fixed list write (everything but the policy). */
function hardening(headers: Record<string, string>): Record<string, string> {
  const own = ['content-type', 'content-length', 'date', 'connection', 'keep-alive', 'content-security-policy', 'x-powered-by'];
  return Object.fromEntries(Object.entries(headers).filter(([name]) => !own.includes(name)));
}

describe('security headers', () => {
  it('gives a page a fresh nonce in its policy on every answer', async () => {
    const [a, b] = [await request(app()).get('/page'), await request(app()).get('/page')];
    const nonce = (text: string) => /<p>([^<]+)<\/p>/.exec(text)![1];
    expect(a.headers['content-security-policy']).toContain(`'nonce-${nonce(a.text)}'`);
    expect(nonce(a.text)).not.toBe(nonce(b.text));
  });

  it('gives an API answer the same hardening as a page, and a policy that loads and frames nothing', async () => {
    const envs: Array<Record<string, string>> = [{}, { NODE_ENV: 'production', PUBLIC_URL: 'https://app.example' }];
    for (const env of envs) {
      const page = await request(app(env)).get('/page');
      const api = await request(app(env)).get('/api/thing');
      expect(api.headers['content-security-policy']).toBe(API_CSP);
      expect(hardening(api.headers)).toEqual(hardening(page.headers));
      expect(Object.keys(hardening(api.headers)).length).toBeGreaterThanOrEqual(8);
    }
  });
});
