import express from 'express';
import request from 'supertest';
import { useLeanJson } from './json-answer';

const body = { items: [{ id: 1, name: 'Marmorino, two coats — «fine»' }], nextCursor: null };

function app() {
  const a = express();
  useLeanJson(a);
  a.get('/list', (_req, res) => res.json(body));
  a.head('/list', (_req, res) => res.json(body));
  a.get('/problem', (_req, res) => res.status(400).type('application/problem+json').json({ title: 'Bad' }));
  a.get('/none', (_req, res) => res.status(204).json({ ignored: true }));
  return a;
}

describe('JSON answers', () => {
  it('sends the JSON text with its UTF-8 length and type, as Express would', async () => {
    const res = await request(app()).get('/list');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(Number(res.headers['content-length'])).toBe(Buffer.byteLength(JSON.stringify(body)));
    expect(res.body).toEqual(body);
  });

  it('keeps a type set before (problem+json), adding the charset', async () => {
    const res = await request(app()).get('/problem');
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toBe('application/problem+json; charset=utf-8');
    expect(res.body).toEqual({ title: 'Bad' });
  });

  it('sends no body to HEAD, nor with 204', async () => {
    const head = await request(app()).head('/list');
    expect(head.status).toBe(200);
    expect(head.text ?? '').toBe('');
    const none = await request(app()).get('/none');
    expect(none.status).toBe(204);
    expect(none.headers['content-type']).toBeUndefined();
    expect(none.text).toBe('');
  });
});
