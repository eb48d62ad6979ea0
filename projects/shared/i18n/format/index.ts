export { type DateStyle, formatAmount, formatCalendarDay, formatDate, formatInstant, formatNumber } from './format';
export { LB_FORMAT_PIPES, LbDatePipe, LbMoneyPipe, LbNumberPipe } from './pipes';
export { dateTimeFormat, listFormat, numberFormat } from './intl-cache';
