import type {
  CashForecast,
  CashJobs,
  CashReceivableInvoice,
  CashReceivableInvoices,
  CashReceivables,
  CashReceived,
} from '@layerbook/contracts/types';
import type { ReceivableDrill } from './receivable-drill';

/** Answers of the cash API for the specs: one firm in dollars, as of 2 December 2026. */
const zero = { current: '0.00', '1-30': '0.00', '31-60': '0.00', '61-90': '0.00', '90+': '0.00' } as const;

export const RECEIVABLES: CashReceivables = {
  asOf: '2026-12-02',
  currency: 'USD',
  buckets: { ...zero, current: '1200.00', '31-60': '2450.00', '90+': '300.00' },
  total: '3950.00',
  retainage: '640.00',
  clients: [
    {
      clientId: 'c-1',
      clientName: 'Ada Ward',
      buckets: { ...zero, '31-60': '2450.00' },
      total: '2450.00',
      retainage: '640.00',
      invoiceCount: 1,
    },
    {
      clientId: 'c-2',
      clientName: 'Hollis Tea Rooms',
      buckets: { ...zero, current: '1200.00', '90+': '300.00' },
      total: '1500.00',
      retainage: '0.00',
      invoiceCount: 2,
    },
  ],
  invoiceCount: 3,
  clientCount: 2,
};

/** The open invoices behind RECEIVABLES (the drill-down's answers are cut from them). */
export const OPEN_INVOICES: readonly CashReceivableInvoice[] = [
  {
    invoiceId: 'inv-9',
    number: 'INV-0009',
    clientId: 'c-2',
    clientName: 'Hollis Tea Rooms',
    jobId: 'job-2',
    jobTitle: 'Tea room stencils',
    dueOn: '2026-08-20',
    daysPastDue: 104,
    bucket: '90+',
    amountDue: '300.00',
    retainage: '0.00',
  },
  {
    invoiceId: 'inv-7',
    number: 'INV-0007',
    clientId: 'c-1',
    clientName: 'Ada Ward',
    jobId: 'job-1',
    jobTitle: 'Hall in lime plaster',
    dueOn: '2026-10-28',
    daysPastDue: 35,
    bucket: '31-60',
    amountDue: '2450.00',
    retainage: '640.00',
  },
  {
    invoiceId: 'inv-12',
    number: 'INV-0012',
    clientId: 'c-2',
    clientName: 'Hollis Tea Rooms',
    jobId: 'job-2',
    jobTitle: 'Tea room stencils',
    dueOn: '2026-12-16',
    daysPastDue: -14,
    bucket: 'current',
    amountDue: '1200.00',
    retainage: '0.00',
  },
];

/** What the server answers for a drill-down: the invoices of that age and client, most overdue first. */
export function drillAnswer(drill: ReceivableDrill): CashReceivableInvoices {
  return {
    asOf: drill.asOf ?? RECEIVABLES.asOf,
    currency: 'USD',
    age: drill.age,
    clientId: drill.clientId,
    invoices: OPEN_INVOICES.filter(
      (i) => (drill.age === null || i.bucket === drill.age) && (drill.clientId === null || i.clientId === drill.clientId),
    ),
  };
}

const months = [
  '2026-01',
  '2026-02',
  '2026-03',
  '2026-04',
  '2026-05',
  '2026-06',
  '2026-07',
  '2026-08',
  '2026-09',
  '2026-10',
  '2026-11',
  '2026-12',
];
export const RECEIVED: CashReceived = {
  currency: 'USD',
  months: months.map((month) =>
    month === '2026-11'
      ? { month, received: '5200.00', paymentCount: 3, refunded: '200.00', refundCount: 1, net: '5000.00' }
      : { month, received: '0.00', paymentCount: 0, refunded: '0.00', refundCount: 0, net: '0.00' },
  ),
  totals: { received: '5200.00', refunded: '200.00', net: '5000.00' },
};

const week = (weekStart: string, isoWeek: string, invoices: string, scheduled: string, pipeline: string, total: string) => ({
  weekStart,
  isoWeek,
  invoices,
  scheduled,
  pipeline,
  total,
});
export const FORECAST: CashForecast = {
  asOf: '2026-12-02',
  currency: 'USD',
  weeks: [
    week('2026-11-30', '2026-W49', '2750.00', '0.00', '0.00', '2750.00'),
    week('2026-12-07', '2026-W50', '0.00', '1800.00', '150.00', '1950.00'),
    ...Array.from({ length: 11 }, (_, i) => week(`2026-12-${14 + i}`, `2026-W${51 + i}`, '0.00', '0.00', '0.00', '0.00')),
  ],
  beyondHorizon: { invoices: '0.00', scheduled: '900.00', pipeline: '0.00', total: '900.00' },
  totals: { invoices: '2750.00', scheduled: '2700.00', pipeline: '150.00', total: '5600.00' },
  odds: [{ stage: 'proposal_sent', label: 'Proposal sent', percent: 30, source: 'firm', openCount: 1 }],
  notes: ['Open invoices fall in the week they are due; late ones in this week.'],
};

export const OWNER_JOBS: CashJobs = {
  currency: 'USD',
  winRate: { accepted: 3, decided: 5, percent: '60.0' },
  averageJobSize: '8400.00',
  marginsShown: true,
  jobCount: 1,
  jobs: [
    {
      jobId: 'job-1',
      title: 'Hall in lime plaster',
      clientId: 'c-1',
      clientName: 'Ada Ward',
      status: 'active',
      estimated: '8000.00',
      contracted: '8800.00',
      changeOrders: '800.00',
      invoiced: '6400.00',
      paid: '3310.00',
      margin: {
        estimatedCost: '5500.00',
        estimatedMargin: '3300.00',
        estimatedMarginPercent: '37.5',
        actualCost: null,
        actualMargin: null,
        actualMarginPercent: null,
        actualMarginReason: 'Actual costs are not recorded yet.',
      },
    },
  ],
};

/** The same jobs as the office gets them: no margins at all. */
export const OFFICE_JOBS: CashJobs = {
  ...OWNER_JOBS,
  marginsShown: false,
  jobs: OWNER_JOBS.jobs.map(({ margin: _margin, ...job }) => job),
};
