import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { DeferBlockBehavior, DeferBlockState, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { JobBillingView } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { JobBilling } from './job-billing';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import { officeWords } from '../../../shared/testing/office-words';

const JOB = '00000000-0000-4000-8000-000000000001';
const CAP_NAME = 'California home improvement contracts (Bus. & Prof. Code §7159): the lesser of $1,000 or 10 %';

function view(over: Partial<JobBillingView> = {}): JobBillingView {
  return {
    jobId: JOB,
    currency: 'USD',
    method: 'schedule',
    originalContractSum: '12000.00',
    contractSum: '12000.00',
    contractTax: '0.00',
    billingStartedAt: null,
    terms: {
      depositCapName: CAP_NAME,
      depositCap: '1000.00',
      terms: { kind: 'net', days: 14 },
      retainage: { workPercent: 0, storedPercent: 0, stopAtPercentComplete: null },
      depositCredit: 'prorata',
    },
    walkthroughOn: null,
    lines: [
      {
        id: 'l1',
        position: 1,
        label: 'Deposit',
        role: 'deposit',
        trigger: { kind: 'acceptance' },
        layerName: null,
        amount: '1000.00',
        expectedOn: null,
        status: 'ready',
        invoiceId: 'i1',
        triggerProgress: 'Met when billing started',
      },
      {
        id: 'l2',
        position: 2,
        label: 'Base coat',
        role: 'milestone',
        trigger: { kind: 'layerComplete', layerId: 'base' },
        layerName: 'Lime base coat',
        amount: '6000.00',
        expectedOn: '2026-12-14',
        status: 'draft',
        invoiceId: null,
        triggerProgress: '1 of 2 surfaces done',
      },
      {
        id: 'l3',
        position: 3,
        label: 'Final',
        role: 'final',
        trigger: { kind: 'walkthrough' },
        layerName: null,
        amount: '5000.00',
        expectedOn: null,
        status: 'draft',
        invoiceId: null,
        triggerProgress: '',
      },
    ],
    workItems: [
      {
        id: 'w1',
        position: 1,
        roomName: 'Dining room',
        surfaceId: 's1',
        surfaceName: 'Walls',
        layerId: 'base',
        layerName: 'Lime base coat',
        layerOrder: 1,
        doneOn: '2026-12-10',
        changeOrder: null,
      },
      {
        id: 'w2',
        position: 2,
        roomName: 'Dining room',
        surfaceId: 's1',
        surfaceName: 'Walls',
        layerId: 'glaze',
        layerName: 'Glaze',
        layerOrder: 2,
        doneOn: null,
        changeOrder: null,
      },
    ],
    valueLines: [],
    invoices: [],
    changeOrders: [],
    totals: { invoiced: '0.00', paid: '0.00', unbilled: '12000.00', retainageHeld: '0.00' },
    readyToBill: 1,
    ...over,
  };
}

async function render(v: JobBillingView) {
  TestBed.configureTestingModule({
    // The lower sections are deferred blocks (built in the browser once idle): drawn here at once.
    deferBlockBehavior: DeferBlockBehavior.Manual,
    imports: [JobBilling],
    providers: [
      provideTestI18n(officeWords),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  await TestBed.compileComponents();
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(JobBilling);
  fixture.componentRef.setInput('jobId', JOB);
  fixture.detectChanges();
  http.expectOne(`/api/jobs/${JOB}/billing`).flush(v);
  await new Promise((resolve) => setTimeout(resolve));
  TestBed.tick();
  for (const block of await fixture.getDeferBlocks()) await block.render(DeferBlockState.Complete);
  TestBed.tick();
  http.expectOne(`/api/jobs/${JOB}/history`).flush({ items: [] });
  await new Promise((resolve) => setTimeout(resolve));
  TestBed.tick();
  // The change-order panel (features/jobs/change-orders) reads its own list.
  for (const list of http.match((req) => req.url.endsWith('/change-orders'))) list.flush({ items: [] });
  await fixture.whenStable();
  return { fixture, http, host: fixture.nativeElement as HTMLElement };
}

// Rendering every section (Material fields, datepickers) takes seconds in jsdom on a busy machine.
describe('JobBilling (the job page billing sections)', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows the totals, the terms by the rule name, the ready count and the checks in words', async () => {
    const { host } = await render(view());
    const text = host.textContent ?? '';
    expect(text).toContain('Ready to bill: 1');
    expect(text).toContain(CAP_NAME);
    expect(text).toContain('At most $1,000.00 on this job.');
    expect(text).toContain('Net 14 (due 14 days after the invoice date)');
    expect(text).toContain('The lines add up to the contract sum of $12,000.00.');
    expect(text).toContain(`The deposit of $1,000.00 is within $1,000.00, the cap under “${CAP_NAME}”.`);
    expect(text).toContain('Review its draft invoice');
    expect(text).toContain('1 of 2 layers done');
    expect(text).toContain('Start billing');
  });

  it('puts every wide table in a keyboard-reachable named region', async () => {
    const { host } = await render(view());
    const wraps = Array.from(host.querySelectorAll('.table-wrap'));
    expect(wraps.length).toBeGreaterThan(0);
    for (const wrap of wraps) {
      expect(wrap.getAttribute('tabindex')).toBe('0');
      expect(wrap.getAttribute('role')).toBe('region');
      expect(wrap.getAttribute('aria-label') ?? wrap.getAttribute('aria-labelledby')).toBeTruthy();
    }
  });

  it('says by how much the lines miss the contract sum while the office types', async () => {
    const { fixture, host } = await render(view());
    const amounts = Array.from(host.querySelectorAll<HTMLInputElement>('input[formcontrolname="amount"]'));
    amounts[2].value = '4990';
    amounts[2].dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(host.textContent).toContain('The lines add up to $11,990.00: $10.00 short of the contract sum of $12,000.00.');
  });

  it('marks a layer done with the day and a fresh key, then reads the billing and history again', async () => {
    const { fixture, http, host } = await render(view());
    const button = Array.from(host.querySelectorAll('button')).find((b) => b.textContent?.trim() === 'Mark done');
    button?.click();
    const sent = http.expectOne(`/api/jobs/${JOB}/progress`);
    const body = sent.request.body as { kind: string; workItemId: string; on: string; clientKey: string };
    expect(body).toMatchObject({ kind: 'layerDone', workItemId: 'w2' });
    expect(body.on).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(body.clientKey).toMatch(/^[0-9a-f-]{36}$/);
    sent.flush({ workItems: [], walkthroughOn: null }, { status: 201, statusText: 'Created' });
    // The reloads are pending requests, so the fixture is not stable until they are answered.
    await new Promise((resolve) => setTimeout(resolve));
    TestBed.tick();
    http.expectOne(`/api/jobs/${JOB}/billing`).flush(view());
    http.expectOne(`/api/jobs/${JOB}/history`).flush({ items: [] });
    await fixture.whenStable();
  });

  it('shows the server’s refusal to reopen a layer beside that layer, naming the invoice to void', async () => {
    const { fixture, http, host } = await render(view());
    const reopen = Array.from(host.querySelectorAll('button')).find((b) => b.textContent?.trim() === 'Reopen');
    reopen?.click();
    const said =
      'Invoice INV-0004 bills the payment due when this layer is done, so it stays done. If the work is not done, void INV-0004 first, then reopen the layer.';
    http
      .expectOne(`/api/jobs/${JOB}/progress`)
      .flush(
        { type: 'about:blank', title: 'Conflict', status: 409, detail: said, errors: [{ field: 'workItemId', message: said }] },
        { status: 409, statusText: 'Conflict' },
      );
    await fixture.whenStable();
    const alert = Array.from(host.querySelectorAll('.layers [role="alert"]'));
    expect(alert.map((a) => a.textContent?.trim())).toEqual([said]);
    expect(alert[0].closest('li')?.textContent).toContain('Lime base coat');
  });

  it('lists a change order’s redo of a surface apart from the sold layers', async () => {
    const redo = { ...view().workItems[0], id: 'w3', position: 3, doneOn: null, changeOrder: 2 };
    const { host } = await render(view({ workItems: [...view().workItems, redo] }));
    const groups = Array.from(host.querySelectorAll('.surface[role="group"]')).map((g) => g.getAttribute('aria-label'));
    expect(groups).toEqual(['Dining room · Walls', 'Dining room · Walls · Added by change order #2']);
  });

  it('shows what the server refuses beside the field, or under the lines when no field carries it', async () => {
    const { fixture, http, host } = await render(view());
    const save = Array.from(host.querySelectorAll('button')).find((b) => b.textContent?.trim() === 'Save the schedule');
    save?.click();
    const sent = http.expectOne({ method: 'PUT', url: `/api/jobs/${JOB}/billing/schedule` });
    expect((sent.request.body as { lines: unknown[] }).lines).toHaveLength(3);
    sent.flush(
      {
        type: 'about:blank',
        title: 'Check the highlighted fields.',
        status: 400,
        errors: [
          { field: 'lines', message: 'Keep that line.' },
          { field: 'lines[1].amount', message: 'Enter the amount as the contract allows.' },
        ],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(host.textContent).toContain('Keep that line.');
    expect(host.textContent).toContain('Enter the amount as the contract allows.');
  });

  it('switching to progress billing asks to keep only the deposit, and does it on request', async () => {
    const { fixture, host } = await render(view());
    const progress = host.querySelector<HTMLInputElement>('input[type="radio"][value="progress"]');
    progress?.click();
    await fixture.whenStable();
    expect(host.textContent).toContain('Billing by progress keeps only the deposit in this schedule');
    Array.from(host.querySelectorAll('button'))
      .find((b) => b.textContent?.trim() === 'Keep only the deposit')
      ?.click();
    await fixture.whenStable();
    expect(host.textContent).not.toContain('Billing by progress keeps only the deposit in this schedule');
    expect(host.querySelectorAll('input[formcontrolname="amount"]')).toHaveLength(1);
  });
});
