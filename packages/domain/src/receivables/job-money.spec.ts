import { expectInputError } from '../errors/expect-input-error';
import { averageJobSize, grossMargin, jobMoney, winRate } from './job-money';

describe('job money', () => {
  it('win rate is accepted ÷ decided (sales glossaries, common practice, no source)', () => {
    expect(winRate(3, 5).percent?.toFixed(1)).toBe('37.5');
    expect(winRate(2, 1)).toMatchObject({ accepted: 2, decided: 3 });
    expect(winRate(2, 1).percent?.toFixed(1)).toBe('66.7');
    expect(winRate(0, 0).percent).toBeNull();
    expectInputError(() => winRate(-1, 0), 'accepted');
  });

  it('average job size is the mean contract sum (common practice, no source)', () => {
    expect(averageJobSize('17500.01', 3)?.toFixed(2)).toBe('5833.34'); // 10000.00 + 5000.00 + 2500.01
    expect(averageJobSize('0', 0)).toBeNull();
    expectInputError(() => averageJobSize('100.00', 1.5), 'jobCount');
  });

  it('gross margin is price − cost, and ÷ price (margin, not markup; accounting glossaries)', () => {
    const m = grossMargin('10000.00', { labour: '4000', materialsCost: '1500', equipment: '200', subcontracts: '0', sundries: '300' });
    expect([m.cost.toFixed(2), m.margin.toFixed(2), m.percent?.toFixed(1)]).toEqual(['6000.00', '4000.00', '40.0']);
    expect(grossMargin('0', { labour: '1', materialsCost: '0', equipment: '0', subcontracts: '0', sundries: '0' }).percent).toBeNull();
    expectInputError(
      () => grossMargin('1', { labour: '-1', materialsCost: '0', equipment: '0', subcontracts: '0', sundries: '0' }),
      'costs.labour',
    );
  });

  it('contracted includes approved change orders; invoiced is less credit notes; paid is less refunds (common practice, no source)', () => {
    const j = jobMoney({
      originalContractSum: '12000.00',
      approvedChangeOrders: '-500.00',
      issued: '8000.00',
      credited: '1000.00',
      paymentsApplied: '6000.00',
      refunded: '250.00',
    });
    expect([j.contracted, j.changeOrders, j.invoiced, j.paid].map((d) => d.toFixed(2))).toEqual([
      '11500.00',
      '-500.00',
      '7000.00',
      '5750.00',
    ]);
  });
});
