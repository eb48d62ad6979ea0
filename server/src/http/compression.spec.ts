import express from 'express';
import request from 'supertest';
import { compressAnswers } from './compression';

const big = { lines: Array.from({ length: 200 }, (_, i) => ({ n: i, text: 'lime putty, two coats' })) };

function app() {
  const a = express();
  a.use(compressAnswers());
  a.get('/json', (_req, res) => res.json(big));
  a.get('/small', (_req, res) => res.json({ ok: true }));
  a.get('/page', (_req, res) => res.type('html').send(`<!doctype html><p>${'Venetian plaster '.repeat(200)}</p>`));
  a.get('/csv', (_req, res) => res.type('text/csv').send('a,b\n'.repeat(1000)));
  a.get('/problem', (_req, res) =>
    res
      .status(400)
      .type('application/problem+json')
      .send(JSON.stringify({ detail: 'x'.repeat(2000) })),
  );
  return a;
}

describe('compressed answers', () => {
  it('sends JSON in brotli when the browser takes it, and it decodes to the same answer', async () => {
    const res = await request(app()).get('/json').set('accept-encoding', 'gzip, deflate, br');
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.body).toEqual(big); // supertest undoes the brotli
  });

  it('uses gzip for HTML and problems when brotli is not offered', async () => {
    const page = await request(app()).get('/page').set('accept-encoding', 'gzip');
    expect(page.headers['content-encoding']).toBe('gzip');
    expect(page.text).toContain('Venetian plaster');
    const problem = await request(app()).get('/problem').set('accept-encoding', 'gzip');
    expect(problem.headers['content-encoding']).toBe('gzip');
  });

  it('leaves small answers, CSV exports and clients that take no encoding alone', async () => {
    expect((await request(app()).get('/small').set('accept-encoding', 'br')).headers['content-encoding']).toBeUndefined();
    expect((await request(app()).get('/csv').set('accept-encoding', 'br')).headers['content-encoding']).toBeUndefined();
    expect((await request(app()).get('/json').set('accept-encoding', 'identity')).headers['content-encoding']).toBeUndefined();
  });
});
