import type { CheckoutStatus, PortalInvoiceDetail } from '@layerbook/contracts/types';

/** An open deposit invoice of an invented firm and client, as the portal reads it. */
export const openDeposit: PortalInvoiceDetail = {
  id: 'inv-1',
  number: 'INV-0007',
  kind: 'deposit',
  status: 'issued',
  isOverdue: false,
  jobId: 'job-1',
  jobTitle: 'Morning room, polished plaster',
  issuedOn: '2026-11-20',
  dueOn: '2026-12-04',
  currency: 'USD',
  total: '1200.00',
  amountDue: '1200.00',
  locale: 'en-US',
  lines: [{ label: 'Deposit', amount: '1200.00' }],
  progress: null,
  depositCredit: '0.00',
  taxIncluded: '0.00',
  amountPaid: '0.00',
  amountCredited: '0.00',
  document: {
    firm: { name: 'Quillfeather Finishes', addressLines: ['4 Tanner Row'], phone: '', taxId: '', logoFileId: null },
    client: { name: 'Odile Marchbank', email: 'odile@marchbank.example', addressLines: ['9 Sedge Lane'] },
    site: { label: 'Sedge Lane house', addressLines: ['9 Sedge Lane'] },
    jobTitle: 'Morning room, polished plaster',
    termsText: 'Net 14',
    depositCapName: 'No deposit limit',
    footer: '',
    locale: 'en-US',
  },
  creditNote: null,
  canPayOnline: true,
  payOnlineReason: null,
  receipts: [],
};

export const paidDeposit: PortalInvoiceDetail = {
  ...openDeposit,
  status: 'paid',
  amountPaid: '1200.00',
  amountDue: '0.00',
  canPayOnline: false,
  receipts: [{ id: 'pay-1', kind: 'payment', number: 'RCT-0007', on: '2026-11-22', method: 'card', amount: '1200.00', currency: 'USD' }],
};

export const checkout = (state: CheckoutStatus['state'], paid = false): CheckoutStatus => ({
  checkoutId: 'co-1',
  state,
  amount: '1200.00',
  currency: 'USD',
  paymentId: paid ? 'pay-1' : null,
  receiptNumber: paid ? 'RCT-0007' : null,
  credit: null,
});
