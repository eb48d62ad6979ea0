import { z } from 'zod';
import { moneyAmount, text } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import {
  BILLING_LIMITS as L,
  DEPOSIT_AT_ACCEPTANCE,
  DEPOSIT_CREDIT_RULES,
  NONE_AFTER_WORDS,
  PREFIX_CLASH_WORDS,
  prefixClash,
  type BillingSettings,
} from './billing-settings-types';

const percent = (label: string) =>
  z
    .number({ error: `Enter ${label} as a number of percent.` })
    .min(L.percent.min, { error: 'Cannot be negative.' })
    .max(L.percent.max, { error: `At most ${L.percent.max} %.` });

/** Days of a reminder step (1–90), or null for none. */
const reminderDays = (label: string) =>
  z
    .number({ error: `Enter ${label} as a whole number of days.` })
    .int({ error: 'Use a whole number of days.' })
    .min(L.reminderDays.min, { error: `Use ${L.reminderDays.min} to ${L.reminderDays.max} days.` })
    .max(L.reminderDays.max, { error: `Use ${L.reminderDays.min} to ${L.reminderDays.max} days.` })
    .nullable();

const prefix = (label: string) =>
  z
    .string({ error: `${label} must be text.` })
    .trim()
    .max(L.prefixMaxLength, { error: `Use at most ${L.prefixMaxLength} characters.` })
    .regex(/^[A-Za-z0-9 ./_-]*$/, { error: 'Use letters, digits, spaces and . / _ - only.' });

const depositCap = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('none') }),
    z.strictObject({ kind: z.literal('amount'), amount: moneyAmount }),
    z.strictObject({ kind: z.literal('share'), percent: percent('the share') }),
    z.strictObject({ kind: z.literal('lesserOf'), amount: moneyAmount, percent: percent('the share') }),
  ],
  { error: 'Choose no limit, an amount, a share, or the lesser of an amount and a share.' },
);

const terms = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('onReceipt') }),
    z.strictObject({
      kind: z.literal('net'),
      days: z
        .number({ error: 'Enter the number of days.' })
        .int({ error: 'Use a whole number of days.' })
        .min(L.termsDays.min, { error: `Use ${L.termsDays.min} to ${L.termsDays.max} days.` })
        .max(L.termsDays.max, { error: `Use ${L.termsDays.min} to ${L.termsDays.max} days.` }),
    }),
  ],
  { error: 'Choose on receipt or net a number of days.' },
);

/** PUT /api/firm/billing: the whole settings, every field named on a problem. */
export const billingSettings = requestSchema<BillingSettings>()(
  z
    .strictObject({
      depositCap,
      depositCapName: z
        .string({ error: 'Name the deposit rule.' })
        .trim()
        .min(1, { error: 'Name the deposit rule (for example "No deposit limit").' })
        .max(L.depositCapNameMaxLength, { error: `Use at most ${L.depositCapNameMaxLength} characters.` }),
      terms,
      retainage: z.strictObject({
        workPercent: percent('retainage on work'),
        storedPercent: percent('retainage on stored materials'),
        stopAtPercentComplete: percent('the stop').nullable(),
      }),
      depositCredit: z.enum(DEPOSIT_CREDIT_RULES, { error: 'Choose how the deposit is credited.' }),
      // Settings saved before this choice existed keep today's behaviour.
      depositAtAcceptance: z
        .enum(DEPOSIT_AT_ACCEPTANCE, { error: 'Choose whether the deposit is drafted or issued and e-mailed at acceptance.' })
        .default('draft'),
      reminders: z
        .strictObject({
          isOn: z.boolean({ error: 'Say whether reminders are on.' }),
          daysBefore: reminderDays('the days before'),
          onDueDate: z.boolean({ error: 'Say whether to remind on the due date.' }),
          everyDaysAfter: reminderDays('the days between reminders'),
          maxAfter: z
            .number({ error: 'Enter a number of reminders.' })
            .int({ error: 'Use a whole number.' })
            .min(L.maxAfter.min, { error: 'Cannot be negative.' })
            .max(L.maxAfter.max, { error: `At most ${L.maxAfter.max}.` }),
        })
        .superRefine((reminders, check) => {
          if (reminders.isOn && reminders.everyDaysAfter !== null && reminders.maxAfter === 0) {
            check.addIssue({ code: 'custom', path: ['maxAfter'], message: NONE_AFTER_WORDS });
          }
        }),
      invoicePrefix: prefix('The invoice prefix'),
      creditNotePrefix: prefix('The credit-note prefix'),
      invoiceFooter: text(L.footerMaxLength, 'The footer'),
    })
    .superRefine((settings, check) => {
      const clash = prefixClash(settings.invoicePrefix, settings.creditNotePrefix);
      if (clash) check.addIssue({ code: 'custom', path: [clash.field], message: PREFIX_CLASH_WORDS[clash.clash] });
    }),
);
