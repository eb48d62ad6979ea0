import { withTenant } from '@layerbook/db';
import { fieldsFromDuplicate, type MergedFields } from './merge-fields';
import { addClient } from './client-fixtures';
import { signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const blank: MergedFields = { name: 'Rosalind Quarrie', email: '', phone: '', notes: '', language: null };

describe('fieldsFromDuplicate', () => {
  it.each<[string, Partial<MergedFields>, Partial<MergedFields>, ReturnType<typeof fieldsFromDuplicate>['patch']]>([
    ['the duplicate knew nothing more', { email: 'r@example.test' }, { email: 'R@example.test' }, {}],
    [
      'blank fields are filled',
      {},
      { email: 'r@example.test', phone: '555-0142', language: 'es' },
      { email: 'r@example.test', phone: '555-0142', language: 'es' },
    ],
    ['the kept values stay', { phone: '555-0100', language: 'en' }, { language: 'es' }, {}],
    [
      'its notes go below the kept ones, under its name',
      { notes: 'Prefers texts.' },
      { notes: 'Gate code 4471.' },
      { notes: 'Prefers texts.\n\nFrom the merged record "Rosalind Quarrie":\nGate code 4471.' },
    ],
    [
      'a different e-mail or phone is kept in the notes',
      { email: 'r@example.test', phone: '555-0100' },
      { email: 'rq@example.test', phone: '555-0100' },
      { notes: 'From the merged record "Rosalind Quarrie":\nE-mail: rq@example.test' },
    ],
  ])('%s', (_case, kept, duplicate, patch) => {
    expect(fieldsFromDuplicate({ ...blank, ...kept }, { ...blank, ...duplicate }, 'en').patch).toEqual(patch);
  });

  it('heads the duplicate’s notes in the firm’s language', () => {
    const { patch } = fieldsFromDuplicate(blank, { ...blank, phone: '555-0142', notes: 'Perro en el patio.' }, 'es');
    expect(patch.notes).toBe('Del registro fusionado «Rosalind Quarrie»:\nPerro en el patio.');
  });

  it('refuses notes that together pass the limit, naming intoClientId', () => {
    expect(() => fieldsFromDuplicate({ ...blank, notes: 'a'.repeat(4000) }, { ...blank, notes: 'b'.repeat(1000) }, 'en')).toThrow(
      expect.objectContaining({ status: 400, errors: [expect.objectContaining({ field: 'intoClientId' })] }),
    );
  });
});

describe('merging keeps what only the duplicate knew', () => {
  it('fills the kept client’s blank e-mail, phone and language, adds its notes, and audits what it took', async () => {
    const o = await signUpFirm(t.app, 'Merge Keep Plaster');
    const email = uniqueEmail('rosalind');
    // The office filed her twice: once from a phone call (name only), once properly, with the gate code and her e-mail.
    const kept = await addClient(o, { name: 'Rosalind Quarrie', notes: 'Called about the hallway.' });
    const notes = 'Gate code 4471. Dog in the yard; lime dust bothers her asthma — mask up and seal the doorway.';
    const dup = await addClient(o, { name: 'Rosalind Quarrie', email, phone: '555-010-0142', notes, language: 'es' });
    const merged = await o.agent.post(`/api/clients/${dup}/merge`).set('x-csrf-token', o.csrf()).send({ intoClientId: kept });
    expect(merged.status).toBe(200);
    expect(merged.body).toMatchObject({
      id: kept,
      email,
      phone: '555-010-0142',
      language: 'es',
      notes: `Called about the hallway.\n\nFrom the merged record "Rosalind Quarrie":\n${notes}`,
    });
    const audit = await withTenant(t.ctx.pool, o.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ data: { taken: unknown } }>(`select data from audit_log where action = 'client.merged'`);
      return rows.map((r) => r.data.taken);
    });
    expect(audit).toEqual([{ email, phone: '555-010-0142', language: 'es', notes }]);
  });

  it('refuses a merge whose notes together would be too long to save, and moves nothing', async () => {
    const o = await signUpFirm(t.app, 'Merge Long Notes Plaster');
    const kept = await addClient(o, { name: 'Ada Ward', notes: 'a'.repeat(4000) });
    const dup = await addClient(o, { name: 'Ada Ward', notes: 'b'.repeat(1000) });
    const merged = await o.agent.post(`/api/clients/${dup}/merge`).set('x-csrf-token', o.csrf()).send({ intoClientId: kept });
    expect([merged.status, merged.body.errors?.[0]?.field]).toEqual([400, 'intoClientId']);
    expect((await o.agent.get(`/api/clients/${dup}`)).status).toBe(200);
    expect((await o.agent.get(`/api/clients/${kept}`)).body.notes).toBe('a'.repeat(4000));
  });
});
