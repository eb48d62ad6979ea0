import type { ClientCreditView, PaymentDetail, RefundView } from '@layerbook/contracts/types';

/** Payments, refunds and credits as the API answers them, for the specs of this folder (invented names and figures). */
export const transferPayment: PaymentDetail = {
  id: 'pay-1',
  invoiceId: 'inv-1',
  method: 'transfer',
  amount: '1000.00',
  amountApplied: '1000.00',
  amountRefunded: '0.00',
  refundable: '1000.00',
  currency: 'USD',
  receivedOn: '2026-11-20',
  reference: 'BACS 4471',
  receiptNumber: 'RCT-0007',
  refunds: [],
};

/** A card payment of 500.00 where 380.00 was due: 120.00 kept as credit; 50.00 already given back. */
export const cardOverpayment: PaymentDetail = {
  id: 'pay-2',
  invoiceId: 'inv-1',
  method: 'card',
  amount: '500.00',
  amountApplied: '380.00',
  amountRefunded: '50.00',
  refundable: '450.00',
  currency: 'USD',
  receivedOn: '2026-11-24',
  reference: '',
  receiptNumber: 'RCT-0008',
  refunds: [],
};

export const chequeRefund: RefundView = {
  id: 'ref-1',
  paymentId: 'pay-2',
  method: 'cheque',
  status: 'succeeded',
  amount: '50.00',
  currency: 'USD',
  refundedOn: '2026-11-26',
  reason: 'Paid twice',
  reference: 'Chq 000231',
  receiptNumber: 'RCT-0009',
  failureMessage: null,
};

export const cardRefundPending: RefundView = {
  ...chequeRefund,
  id: 'ref-2',
  method: 'card',
  status: 'pending',
  amount: '70.00',
  refundedOn: '2026-11-27',
  reason: 'Less plaster needed',
  reference: '',
  receiptNumber: null,
};

export const overpaymentCredit: ClientCreditView = {
  id: 'cc-1',
  paymentId: 'pay-2',
  amount: '120.00',
  currency: 'USD',
  note: 'Paid beyond the amount due on INV-0007.',
  createdAt: '2026-11-24T15:00:00.000Z',
  usedOnInvoiceId: null,
};

export const creditGivenBack: ClientCreditView = {
  ...overpaymentCredit,
  id: 'cc-2',
  amount: '-50.00',
  note: 'Refunded to the client',
  createdAt: '2026-11-26T10:00:00.000Z',
};
