import type { ChartData, ChartOptions, TooltipItem } from 'chart.js';
import { barHeight, CHART_COLOURS, seriesFill } from './chart-look';
import {
  CASH_AGING_BUCKETS,
  CASH_AGING_BUCKET_LABELS,
  type CashForecast,
  type CashReceivables,
  type CashReceived,
} from '@layerbook/contracts/types';
import { monthLabel, weekLabel } from './cash-words';
import { formatAmount, numberFormat } from '../../../../../shared/i18n/format';

export type BarData = ChartData<'bar', number[], string>;

/** The API's decimal text behind each bar, by series then bar: what a tooltip prints, as the table beside the chart does. */
export type BarAmounts = readonly (readonly string[])[];

/** The forecast's three parts, in the order they stack, with the words used in the legend and the table. */
export const FORECAST_PARTS = [
  {
    key: 'invoices',
    label: 'Invoices sent, by due date',
    short: 'Invoices sent',
    explain: 'What clients owe on invoices already sent, in the week each is due; anything already late is counted in the first week.',
    colour: CHART_COLOURS.umber,
    pattern: 'solid',
  },
  {
    key: 'scheduled',
    label: 'Still to bill, by the work schedule',
    short: 'Still to bill',
    explain: "Payments in each job's billing plan not invoiced yet, in the week the work schedule says they fall due.",
    colour: CHART_COLOURS.verdigris,
    pattern: 'stripes',
  },
  {
    key: 'pipeline',
    label: 'Deposits from open inquiries, at stage odds',
    short: 'Likely deposits',
    explain: 'Deposits that open inquiries would bring if they turn into jobs, counted at the odds of their stage.',
    colour: CHART_COLOURS.ochre,
    pattern: 'dots',
  },
] as const;

const AGE_COLOURS = [CHART_COLOURS.verdigris, CHART_COLOURS.ochre, CHART_COLOURS.umber, CHART_COLOURS.rust, CHART_COLOURS.slate];

/** Money owed by age, one figure per age (one series). */
export const agingAmounts = (receivables: CashReceivables): BarAmounts => [CASH_AGING_BUCKETS.map((bucket) => receivables.buckets[bucket])];

/** Money owed by age: one bar per age, each named on its axis. */
export function agingChart(receivables: CashReceivables): BarData {
  const [owed = []] = agingAmounts(receivables);
  return {
    labels: CASH_AGING_BUCKETS.map((bucket) => CASH_AGING_BUCKET_LABELS[bucket]),
    datasets: [{ label: 'Owed', data: owed.map(barHeight), backgroundColor: AGE_COLOURS }],
  };
}

/** Cash received by month, less refunds (one series). */
export const receivedAmounts = (received: CashReceived): BarAmounts => [received.months.map((month) => month.net)];

/** Cash received by month, less refunds given in that month. */
export function receivedChart(received: CashReceived): BarData {
  const [net = []] = receivedAmounts(received);
  return {
    labels: received.months.map((month) => monthLabel(month.month)),
    datasets: [{ label: 'Received, less refunds', data: net.map(barHeight), backgroundColor: CHART_COLOURS.verdigris }],
  };
}

/** Cash expected by week, one series per forecast part, in the order they stack. */
export const forecastAmounts = (forecast: CashForecast): BarAmounts =>
  FORECAST_PARTS.map((part) => forecast.weeks.map((week) => week[part.key]));

/** Cash expected by week, its three parts stacked and each filled its own way. */
export function forecastChart(forecast: CashForecast): BarData {
  const amounts = forecastAmounts(forecast);
  return {
    labels: forecast.weeks.map((week) => weekLabel(week.weekStart)),
    datasets: FORECAST_PARTS.map((part, i) => ({
      label: part.label,
      data: (amounts[i] ?? []).map(barHeight),
      backgroundColor: seriesFill(part.colour, part.pattern),
      borderColor: part.colour,
      borderWidth: 1,
      stack: 'expected',
    })),
  };
}

/**
 * Options shared by the cash charts: amounts on the value axis in the firm's currency, legend only
 * when there are several series. The axis rounds to whole units (its steps are round figures); a
 * tooltip names one bar, so it prints that bar's API amount exactly as the table does (`money` pipe:
 * formatAmount, the currency's own minor units), never the float the bar is drawn from.
 */
export function barOptions(
  currency: string,
  locale: string,
  amounts: BarAmounts,
  options: { stacked?: boolean; legend?: boolean } = {},
): ChartOptions<'bar'> {
  const axisMoney = numberFormat(locale, { style: 'currency', currency, maximumFractionDigits: 0 });
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    scales: {
      x: { stacked: options.stacked ?? false, grid: { display: false } },
      y: { stacked: options.stacked ?? false, beginAtZero: true, ticks: { callback: (value) => axisMoney.format(Number(value)) } },
    },
    plugins: {
      legend: { display: options.legend ?? false, position: 'bottom' },
      tooltip: { callbacks: { label: (item) => barTooltip(item, amounts, currency, locale) } },
    },
  };
}

/** One bar's tooltip line: its series and its amount as the table prints it. */
export function barTooltip(item: TooltipItem<'bar'>, amounts: BarAmounts, currency: string, locale: string): string {
  return `${item.dataset.label ?? ''}: ${formatAmount(amounts[item.datasetIndex]?.[item.dataIndex], currency, locale)}`;
}
