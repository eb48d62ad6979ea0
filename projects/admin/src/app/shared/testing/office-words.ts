import billing from '../../../i18n/billing/en.json';
import cash from '../../../i18n/cash/en.json';
import firms from '../../../i18n/firms/en.json';
import jobs from '../../../i18n/jobs/en.json';
import payments from '../../../i18n/payments/en.json';
import ui from '../../../i18n/ui/en.json';

/**
 * For component specs of the office's money screens, which render each other's parts (the invoice
 * page holds the payments, the job page the billing): their English words by area, for
 * `provideTestI18n(officeWords)`.
 */
export const officeWords = { billing, cash, firms, jobs, payments, ui };
