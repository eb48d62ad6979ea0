import { z } from 'zod';
import { isoDate, moneyAmount, text } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import { PAYMENT_LIMITS as L, PAYMENT_METHODS, type RefundCreate } from './payment-types';

/** POST /api/payments/:id/refunds */
export const refundCreate = requestSchema<RefundCreate>()(
  z.strictObject({
    method: z.enum(PAYMENT_METHODS, { error: 'Choose card (online), cheque, transfer or cash.' }),
    amount: moneyAmount,
    reason: text(L.reasonMaxLength, 'The reason'),
    refundedOn: isoDate.optional(),
    reference: text(L.referenceMaxLength, 'The reference').optional(),
    clientKey: z
      .string({ error: 'The refund key must be text.' })
      .min(1, { error: 'The refund key cannot be empty.' })
      .max(L.clientKeyMaxLength, { error: `Use at most ${L.clientKeyMaxLength} characters.` })
      .optional(),
  }),
);
