import { describe, expect, it } from 'vitest';
import { formFieldOf, previewLine, progressLinesUpdate, startingWork, toWorkToDate, workToDateAmount } from './progress-input';

// DOMAIN.md §2.10-style line: scheduled 10,000.00, 2,000.00 billed before, 1,500.00 this period on the draft.
const line = {
  scheduledValue: '10000.00',
  previousWork: '2000.00',
  thisPeriodWork: '1500.00',
  storedMaterials: '0.00',
  percentComplete: '35',
};

describe('progress line input', () => {
  it('starts the amount field at the work billed to date (previous + this period)', () => {
    expect(workToDateAmount(line, 'USD')).toBe('3500.00');
    expect(startingWork(line, 'amount', 'USD')).toBe('3500.00');
    expect(workToDateAmount({ ...line, previousWork: '0.1', thisPeriodWork: '0.2' }, 'USD')).toBe('0.30'); // no float: 0.1 + 0.2
    expect(workToDateAmount({ ...line, previousWork: '1000', thisPeriodWork: '500' }, 'JPY')).toBe('1500');
  });

  it('starts the percent field at the percent complete only when nothing is stored (it counts stored materials)', () => {
    expect(startingWork(line, 'percent', 'USD')).toBe('35');
    expect(startingWork({ ...line, storedMaterials: '500.00', percentComplete: '40' }, 'percent', 'USD')).toBe('');
  });

  it.each([
    ['percent', '62.5', { percent: 62.5 }],
    ['percent', ' 40 % ', { percent: 40 }],
    ['percent', '100', { percent: 100 }],
    ['percent', '33.3333', { percent: 33.3333 }], // the API takes four decimals
    ['percent', '33.33333', null],
    ['percent', '1000', null],
    ['percent', 'half', null],
    ['percent', '', null],
    ['amount', '12,500.50', { amount: '12500.50' }],
    ['amount', '12.505', null],
    ['amount', '-5', null],
    ['amount', '', null],
  ] as const)('reads %s "%s" as %o', (mode, typed, expected) => {
    expect(toWorkToDate(mode, typed)).toEqual(expected);
  });

  it.each([
    // common practice, no source: percent of the scheduled value, rounded half up to the cent (valueLineWork)
    ['percent', '50', { isValid: true, thisPeriod: '3000.00', toDate: '5000.00' }],
    ['percent', '62.55', { isValid: true, thisPeriod: '4255.00', toDate: '6255.00' }],
    ['amount', '6,000', { isValid: true, thisPeriod: '4000.00', toDate: '6000.00' }],
    ['amount', '2000', { isValid: true, thisPeriod: '0.00', toDate: '2000.00' }],
  ] as const)('previews %s "%s" through the domain', (mode, typed, expected) => {
    expect(previewLine(line, mode, typed, 'USD')).toEqual(expected);
  });

  it('says in words why a line cannot be billed so', () => {
    expect(previewLine(line, 'amount', '', 'USD')).toBeNull();
    expect(previewLine(line, 'percent', '101', 'USD')).toEqual({ isValid: false, message: 'The percent complete is between 0 and 100.' });
    expect(previewLine(line, 'percent', 'lots', 'USD')).toEqual({ isValid: false, message: 'Enter a percent from 0 to 100, like 62.5.' });
    const less = previewLine(line, 'amount', '1500', 'USD');
    expect(less).toEqual({
      isValid: false,
      message: 'Work to date 1500.00 is less than the 2000.00 already billed; billed work never goes down.',
    });
    const more = previewLine(line, 'amount', '10000.01', 'USD');
    expect(more).toEqual({ isValid: false, message: 'Work to date 10000.01 is more than the scheduled value 10000.00.' });
  });

  it('sends the lines as the API takes them, blank stored materials as none', () => {
    expect(
      progressLinesUpdate([
        { valueLineId: 'a', mode: 'percent', workToDate: '40', storedMaterials: '' },
        { valueLineId: 'b', mode: 'amount', workToDate: '1,200.00', storedMaterials: '350' },
      ]),
    ).toEqual([
      { valueLineId: 'a', workToDate: { percent: 40 }, storedMaterials: '0' },
      { valueLineId: 'b', workToDate: { amount: '1200.00' }, storedMaterials: '350' },
    ]);
    expect(() => progressLinesUpdate([{ valueLineId: 'a', mode: 'percent', workToDate: '', storedMaterials: '' }])).toThrow();
  });

  it('puts the server’s field errors on the one work field of a line', () => {
    expect(formFieldOf('progressLines.2.workToDate.amount')).toBe('progressLines.2.workToDate');
    expect(formFieldOf('progressLines.0.workToDate.percent')).toBe('progressLines.0.workToDate');
    expect(formFieldOf('progressLines.1.storedMaterials')).toBe('progressLines.1.storedMaterials');
    expect(formFieldOf('progressLines[3].workToDate')).toBe('progressLines.3.workToDate');
    expect(formFieldOf('progressLines[12].storedMaterials')).toBe('progressLines.12.storedMaterials');
    expect(formFieldOf('notes')).toBe('notes');
  });
});
