import type { TooltipItem, TooltipModel } from 'chart.js';
import { describe, expect, it } from 'vitest';
import { agingAmounts, agingChart, barOptions, barTooltip, forecastAmounts, forecastChart, receivedChart } from './cash-charts';
import { FORECAST, RECEIVABLES, RECEIVED } from './cash-fixtures';

describe('cash charts', () => {
  it('draws one bar per age, named on its axis, from the API figures', () => {
    const data = agingChart(RECEIVABLES);
    expect(data.labels).toEqual(['Not yet due', '1–30 days late', '31–60 days late', '61–90 days late', 'Over 90 days late']);
    expect(data.datasets[0]?.data).toEqual([1200, 0, 2450, 0, 300]);
  });

  it('draws cash received less refunds for each of the twelve months', () => {
    const data = receivedChart(RECEIVED);
    expect(data.labels).toHaveLength(12);
    expect(data.labels?.[10]).toBe('Nov 2026');
    expect(data.datasets[0]?.data[10]).toBe(5000);
  });

  it('stacks the three forecast parts, each with its own name and fill, never only a colour', () => {
    const data = forecastChart(FORECAST);
    expect(data.labels?.slice(0, 2)).toEqual(['30 Nov', '7 Dec']);
    expect(data.datasets.map((set) => set.label)).toEqual([
      'Invoices sent, by due date',
      'Still to bill, by the work schedule',
      'Deposits from open inquiries, at stage odds',
    ]);
    expect(data.datasets.map((set) => set.data[1])).toEqual([0, 1800, 150]);
    expect(new Set(data.datasets.map((set) => set.stack))).toEqual(new Set(['expected']));
  });

  it('stacks and shows a legend only where asked', () => {
    const stacked = barOptions('USD', 'en-US', forecastAmounts(FORECAST), { stacked: true, legend: true });
    expect(stacked.scales?.['x']?.stacked).toBe(true);
    expect(stacked.plugins?.legend?.display).toBe(true);
    expect(barOptions('USD', 'en-US', agingAmounts(RECEIVABLES)).plugins?.legend?.display).toBe(false);
  });

  /** A hovered bar as Chart.js hands it to the tooltip: its series, its index and the float it is drawn from. */
  const hovered = (datasetIndex: number, dataIndex: number, label: string, y: number) =>
    ({ datasetIndex, dataIndex, dataset: { label }, parsed: { x: dataIndex, y } }) as unknown as TooltipItem<'bar'>;

  it('prints a bar’s tooltip as the table does: the API amount in the currency’s own minor units, not rounded', () => {
    const owed = { ...RECEIVABLES, buckets: { ...RECEIVABLES.buckets, current: '1435.49' } };
    const label = barOptions('USD', 'en-US', agingAmounts(owed)).plugins?.tooltip?.callbacks?.label;
    expect(label?.call({} as TooltipModel<'bar'>, hovered(0, 0, 'Owed', 1435.49))).toBe('Owed: $1,435.49');
    // the axis keeps whole figures: its steps are round
    const ticks = barOptions('USD', 'en-US', agingAmounts(owed)).scales?.['y']?.ticks as { callback: (value: number) => string };
    expect(ticks.callback(1500)).toBe('$1,500');
  });

  it.each([
    ['USD', 'en-US', '1435.49', 'Owed: $1,435.49'],
    // yen has no minor unit; the Bahraini dinar has three (ISO 4217)
    ['JPY', 'en-US', '143549', 'Owed: ¥143,549'],
    ['BHD', 'en-US', '1435.495', 'Owed: BHD\u00a01,435.495'],
  ])('a %s tooltip in %s shows %s as %s', (currency, locale, amount, said) => {
    expect(barTooltip(hovered(0, 0, 'Owed', Number(amount)), [[amount]], currency, locale)).toBe(said);
  });

  it('names the hovered series and bar of a stacked chart from its own amounts', () => {
    const amounts = forecastAmounts(FORECAST);
    expect(barTooltip(hovered(1, 1, 'Still to bill', 1800), amounts, 'USD', 'en-US')).toBe('Still to bill: $1,800.00');
    expect(barTooltip(hovered(2, 1, 'Likely deposits', 150), amounts, 'USD', 'en-US')).toBe('Likely deposits: $150.00');
  });
});
