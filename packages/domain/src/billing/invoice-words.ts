import { type PaymentTerms, termsText } from './due-date';
import { type PaymentLineInput, type PaymentTrigger, paymentLabel } from './payment-schedule';

/** Words the system wrote, by key (the server's `invoiceWords` area) and params; a date param is formatted for the reader. */
export interface SystemWords {
  readonly key: string;
  readonly params?: Readonly<Record<string, string | number | { readonly date: string }>>;
}

type Role = PaymentLineInput['role'];

/** What paymentLabel writes when a layerComplete trigger has no layer name. */
const UNNAMED_LAYER = 'the chosen layer';

/**
 * The key and params of a payment line's label, when the label is the one paymentLabel wrote for
 * this role and trigger; null when a person typed it (or edited it), so it prints as typed. The
 * layer's name is the firm's own word and stays as it is.
 */
export function paymentLabelWords(label: string, role: Role, trigger: PaymentTrigger): SystemWords | null {
  const key = `line.${role}.${trigger.kind}`;
  switch (trigger.kind) {
    case 'acceptance':
    case 'walkthrough':
      return label === paymentLabel(role, trigger) ? { key } : null;
    case 'date':
      return label === paymentLabel(role, trigger) ? { key, params: { date: { date: trigger.date } } } : null;
    case 'layerComplete': {
      if (label === paymentLabel(role, trigger)) return { key: `${key}Unnamed` };
      // paymentLabel(role, trigger, X) is "<role words> when X is finished on every surface": X is what sits between.
      const [head, tail] = paymentLabel(role, trigger, '\u0000').split('\u0000');
      if (!label.startsWith(head) || !label.endsWith(tail) || label.length <= head.length + tail.length) return null;
      const layer = label.slice(head.length, label.length - tail.length);
      if (layer !== layer.trim() || layer === UNNAMED_LAYER) return null;
      return { key, params: { layer } };
    }
    default:
      return null;
  }
}

/** The payment terms by key, as termsText writes them in English ("Net 14 (…)", "Due on receipt"). */
export function termsWords(terms: PaymentTerms, field = 'terms'): SystemWords {
  termsText(terms, field); // the same checks as the English text
  if (terms.kind === 'onReceipt') return { key: 'terms.onReceipt' };
  return terms.days === 1 ? { key: 'terms.netOneDay', params: { days: 1 } } : { key: 'terms.net', params: { days: terms.days } };
}
