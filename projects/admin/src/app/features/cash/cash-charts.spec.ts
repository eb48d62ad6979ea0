import { describe, expect, it } from 'vitest';
import { agingChart, barOptions, forecastChart, receivedChart } from './cash-charts';
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
    const stacked = barOptions('USD', 'en-US', { stacked: true, legend: true });
    expect(stacked.scales?.['x']?.stacked).toBe(true);
    expect(stacked.plugins?.legend?.display).toBe(true);
    expect(barOptions('USD', 'en-US').plugins?.legend?.display).toBe(false);
  });
});
