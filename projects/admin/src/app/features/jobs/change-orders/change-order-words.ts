import { CHANGE_ORDER_STATUS_LABELS, type ChangeOrderStatus } from '@layerbook/contracts/types';
import { formatMoney } from '@layerbook/domain';

const ICONS: Readonly<Record<ChangeOrderStatus, string>> = {
  draft: 'edit_note',
  sent: 'hourglass_top',
  approved: 'task_alt',
  declined: 'block',
};

/** A change order's status as the office reads it, with its icon. */
export function changeOrderStatus(status: ChangeOrderStatus): { readonly word: string; readonly icon: string } {
  return { word: CHANGE_ORDER_STATUS_LABELS[status], icon: ICONS[status] };
}

/**
 * A change order's amount with its direction always shown: "+$1,082.50" adds to the contract,
 * "-$216.55" deducts. Formatted by the domain's formatMoney, never through a float.
 */
export function signedMoney(amount: string, currency: string, locale: string): string {
  const text = formatMoney(amount, currency, locale);
  return amount.trim().startsWith('-') || /^[0.]+$/.test(amount.trim()) ? text : `+${text}`;
}
