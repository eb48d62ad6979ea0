import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { binary } from '../testing/binary';
import { startTestServer, TestServer } from '../testing/harness';
import { pdfText } from './pdf/pdf-text';
import { sentProposal } from './portal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Sent = Awaited<ReturnType<typeof sentProposal>>;
const accept = (p: Sent, body: object) =>
  p.client.agent
    .post(`/api/portal/proposals/${p.version.id}/accept`)
    .set('x-csrf-token', p.client.csrf())
    .send({ variantId: 'B', signedName: 'Edwina Marl', consent: true, ...body });

const jobOf = (p: Sent) =>
  withTenant(t.ctx.pool, p.firmId, async (tx) => {
    const job = (
      await tx.client.query<{
        id: string;
        contract_sum: string;
        original_contract_sum: string;
        contract_tax: string;
        option_label: string;
      }>(
        `select id, contract_sum::text, original_contract_sum::text, contract_tax::text, option_label from jobs where proposal_version_id = $1`,
        [p.version.id],
      )
    ).rows[0];
    if (!job) return null;
    const lines = await tx.client.query<{ role: string; amount: string; percent: string | null }>(
      `select role, amount::text, trim_scale(percent)::text as percent from payment_schedule_lines where job_id = $1 order by position`,
      [job.id],
    );
    const values = await tx.client.query<{ label: string; scheduled_value: string }>(
      `select label, scheduled_value::text from job_value_lines where job_id = $1 order by position`,
      [job.id],
    );
    return { ...job, lines: lines.rows, values: values.rows };
  });

describe('a client takes an add-on with the option they accept', () => {
  it('grows the contract by the add-on, keeps the deposit, spreads it over the later payments and records it', async () => {
    const p = await sentProposal(t, 'Add-on Plaster Co');
    const option = p.version.snapshot.options.find((o) => o.id === 'B')!;
    const stencil = p.version.snapshot.addOns.find((a) => a.id === 'stencil')!;
    const agreed = new Decimal(option.total).plus(stencil.total).toFixed(2);

    const res = await accept(p, { addOnIds: ['stencil'] });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'accepted', acceptedVariantId: 'B', acceptedAddOnIds: ['stencil'] });

    const job = (await jobOf(p))!;
    expect(job.contract_sum).toBe(agreed);
    expect(job.original_contract_sum).toBe(agreed);
    expect(job.contract_tax).toBe(new Decimal(option.tax).plus(stencil.tax).toFixed(2));
    expect(job.option_label).toBe('Primed only + Stencilled border');
    // The payments add up to the new sum to the cent; the deposit is the one the client read.
    expect(job.lines.reduce((s, l) => s.plus(l.amount), new Decimal(0)).toFixed(2)).toBe(agreed);
    const deposit = option.payments.find((x) => x.role === 'deposit')!;
    expect(job.lines.find((l) => l.role === 'deposit')!.amount).toBe(deposit.amount);
    // The schedule of values gives the add-on a line at its price; the rooms share the rest.
    expect(job.values.at(-1)).toEqual({ label: 'Stencilled border', scheduled_value: stencil.total });
    expect(job.values.reduce((s, v) => s.plus(v.scheduled_value), new Decimal(0)).toFixed(2)).toBe(agreed);

    // The signed copy names the add-on and the total agreed.
    const pdf = await binary(p.client.agent, `/api/portal/proposals/${p.version.id}/signed-pdf`);
    const text = pdfText(pdf.body as Buffer).replace(/\s+/g, ' ');
    expect(text).toContain('Add-on taken');
    expect(text).toContain('Total agreed');

    // The office's view of the version and the audit trail say what was taken.
    const office = await p.agent.get(`/api/proposals/${p.version.id}`);
    expect(office.body.acceptedAddOnIds).toEqual(['stencil']);
    const audit = await withTenant(t.ctx.pool, p.firmId, (tx) =>
      tx.client.query<{ data: { addOnIds: string[]; total: string } }>(
        `select data from audit_log where action = 'proposal.accepted' and entity_id = $1`,
        [p.version.id],
      ),
    );
    expect(audit.rows[0].data).toMatchObject({ addOnIds: ['stencil'], total: agreed });
  });

  it('takes the option exactly as shown when no add-on is ticked', async () => {
    const p = await sentProposal(t, 'No Add-on Plaster Co');
    const option = p.version.snapshot.options.find((o) => o.id === 'B')!;
    expect((await accept(p, { addOnIds: [] })).status).toBe(200);
    const job = (await jobOf(p))!;
    expect(job.contract_sum).toBe(option.total);
    expect(job.lines.map((l) => l.amount)).toEqual(option.payments.map((x) => x.amount));
    expect(job.option_label).toBe('Primed only');
  });

  it.each([
    ['an add-on the proposal does not offer', { addOnIds: ['gilding'] }, 'addOnIds.0'],
    ['the same add-on twice', { addOnIds: ['stencil', 'stencil'] }, 'addOnIds.1'],
    ['a list that is not one', { addOnIds: 'stencil' }, 'addOnIds'],
  ])('refuses %s with a 400 naming the field, and signs nothing', async (_what, body, field) => {
    const p = await sentProposal(t, `Refusing Plaster ${field}`);
    const res = await accept(p, body);
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { field: string }) => e.field)).toContain(field);
    expect(await jobOf(p)).toBeNull();
    const read = await p.client.agent.get(`/api/portal/proposals/${p.version.id}`);
    expect(read.body).toMatchObject({ status: 'sent', acceptedAddOnIds: [] });
  });
});
