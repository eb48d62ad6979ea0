import { PAGE_SIZE_DEFAULT } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { addClient, firmWithFinish } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Page = { items: { label: string; clientName: string }[]; nextCursor: string | null };

describe('the staff list of sample boards', () => {
  it('pages newest first by keyset, so no board drops off the end, even with the same creation time', async () => {
    const f = await firmWithFinish(t, 'Many Boards Plaster');
    const other = await addClient(f, 'Orrin Vale');
    // 120 boards, made directly: the first 60 share one creation time (a cursor must not skip or repeat them).
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `insert into sample_boards (tenant_id, client_id, label, created_at, updated_at)
         select $1, case when n % 2 = 0 then $2::uuid else $3::uuid end, 'Board ' || lpad(n::text, 3, '0'),
                case when n <= 60 then timestamptz '2026-01-05 09:00:00+00' else timestamptz '2026-01-05 09:00:00+00' + n * interval '1 minute' end,
                now()
           from generate_series(1, 120) n`,
        [tx.tenantId, f.clientId, other.clientId],
      ),
    );
    const first = (await f.agent.get('/api/samples')).body as Page;
    expect(first.items).toHaveLength(PAGE_SIZE_DEFAULT);
    expect(first.items[0].label).toBe('Board 120');
    expect(first.nextCursor).toEqual(expect.any(String));

    const seen = [...first.items];
    let cursor = first.nextCursor;
    while (cursor) {
      const page = await f.agent.get('/api/samples').query({ after: cursor, limit: 35 });
      expect(page.status).toBe(200);
      seen.push(...(page.body as Page).items);
      cursor = (page.body as Page).nextCursor;
    }
    expect(seen).toHaveLength(120);
    expect(new Set(seen.map((b) => b.label)).size).toBe(120);
    expect(seen.slice(0, 60).map((b) => b.label)).toEqual(
      Array.from({ length: 60 }, (_, i) => `Board ${String(120 - i).padStart(3, '0')}`),
    );

    const ofOther = (await f.agent.get('/api/samples').query({ clientId: other.clientId, limit: 100 })).body as Page;
    expect(ofOther.items).toHaveLength(60);
    expect(new Set(ofOther.items.map((b) => b.clientName))).toEqual(new Set(['Orrin Vale']));
    expect(ofOther.nextCursor).toBeNull();
  });

  it('answers 400 naming after or limit for a page link it did not write or a page size out of range', async () => {
    const f = await firmWithFinish(t, 'Bad Page Plaster');
    const field = async (query: object) => {
      const res = await f.agent.get('/api/samples').query(query);
      return [res.status, (res.body.errors as { field: string }[]).map((e) => e.field)];
    };
    expect(await field({ after: 'not-a-cursor' })).toEqual([400, ['after']]);
    expect(await field({ after: Buffer.from(JSON.stringify(['yesterday', f.clientId])).toString('base64url') })).toEqual([400, ['after']]);
    expect(await field({ limit: 0 })).toEqual([400, ['limit']]);
    expect(await field({ limit: 101 })).toEqual([400, ['limit']]);
  });
});
