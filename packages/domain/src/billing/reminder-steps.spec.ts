import { addDays } from '../calendar/local-date';
import { expectInputError } from '../errors/expect-input-error';
import { dueDate } from './due-date';
import { type ReminderCadence, reminderSteps, remindersDue } from './reminder-steps';

// The cadences below are illustrative (common practice, no source); each firm sets its own.
const weekly: ReminderCadence = { daysBefore: 3, onDueDate: true, everyDaysAfter: 7, maxAfter: 3 };
const issuedOn = '2027-01-05';
const dueOn = dueDate(issuedOn, { kind: 'net', days: 30 }); // 2027-02-04

/** Runs the daily worker from `from` for `days` days, as an injected clock would, and returns what it sent each day. */
function simulate(
  cadenceOn: (today: string) => ReminderCadence,
  from: string,
  days: number,
  sent: Array<{ step: string; on: string; sentOn: string }> = [],
): Array<{ step: string; on: string; sentOn: string }> {
  for (let d = 0; d < days; d++) {
    const today = addDays(from, d);
    const due = remindersDue({ cadence: cadenceOn(today), dueOn, today, sent });
    if (due) sent.push({ step: due.step, on: due.on, sentOn: today });
  }
  return sent;
}

describe('reminder steps', () => {
  it('a net-30 invoice: three days before, on the due date, then weekly three times', () => {
    expect(dueOn).toBe('2027-02-04');
    expect(reminderSteps(weekly, dueOn)).toEqual([
      { step: 'before:3', on: '2027-02-01' },
      { step: 'due', on: '2027-02-04' },
      { step: 'after:7', on: '2027-02-11' },
      { step: 'after:14', on: '2027-02-18' },
      { step: 'after:21', on: '2027-02-25' },
    ]);
    expect(reminderSteps({ daysBefore: null, onDueDate: false, everyDaysAfter: null, maxAfter: 5 }, dueOn)).toEqual([]);
  });

  it('a simulated month and more, day by day: each step goes once, on its day, and nothing after the last', () => {
    const sent = simulate(() => weekly, issuedOn, 70);
    expect(sent).toEqual([
      { step: 'before:3', on: '2027-02-01', sentOn: '2027-02-01' },
      { step: 'due', on: '2027-02-04', sentOn: '2027-02-04' },
      { step: 'after:7', on: '2027-02-11', sentOn: '2027-02-11' },
      { step: 'after:14', on: '2027-02-18', sentOn: '2027-02-18' },
      { step: 'after:21', on: '2027-02-25', sentOn: '2027-02-25' },
    ]);
  });

  it('a second worker on the same day sends nothing more (the step is already in sent)', () => {
    const sent = [{ step: 'due' }];
    expect(remindersDue({ cadence: weekly, dueOn, today: dueOn, sent })).toBeNull();
  });

  it('the cadence changed mid-way: no step twice, nothing out of order, the after-count spans both cadences', () => {
    // weekly until 2027-02-20 (before:3, due, after:7, after:14 sent), then every 10 days, at most 3 after the due date
    const every10: ReminderCadence = { daysBefore: 5, onDueDate: true, everyDaysAfter: 10, maxAfter: 3 };
    const sent = simulate((today) => (today < '2027-02-20' ? weekly : every10), issuedOn, 90);
    // after:10 (02-14) lies before the after:14 already sent: never sent; after:20 is the third and last after-due reminder
    expect(sent.map((s) => `${s.step} ${s.sentOn}`)).toEqual([
      'before:3 2027-02-01',
      'due 2027-02-04',
      'after:7 2027-02-11',
      'after:14 2027-02-18',
      'after:20 2027-02-24',
    ]);
    expect(new Set(sent.map((s) => s.step)).size).toBe(sent.length);
  });

  it('a cadence lowered below what was already sent sends no more after-due reminders', () => {
    const sent = [{ step: 'after:7' }, { step: 'after:14' }];
    const once: ReminderCadence = { daysBefore: null, onDueDate: true, everyDaysAfter: 30, maxAfter: 1 };
    expect(remindersDue({ cadence: once, dueOn, today: '2027-04-01', sent })).toBeNull();
  });

  it('maxAfter 0: only the reminders before and on the due date', () => {
    const none: ReminderCadence = { ...weekly, maxAfter: 0 };
    expect(reminderSteps(none, dueOn).map((s) => s.step)).toEqual(['before:3', 'due']);
    expect(simulate(() => none, issuedOn, 70).map((s) => s.step)).toEqual(['before:3', 'due']);
  });

  it.each([
    // the worker was down from 01-31 to 02-12: only the latest pending step goes, the earlier ones are skipped for good
    // (the before and due steps, whose words say "due on …" and "due today", are past their time and not even pending)
    ['2027-02-12', [], { step: 'after:7', on: '2027-02-11', skipped: [] }],
    ['2027-02-13', [{ step: 'after:7' }], null],
    // the due-date reminder is sent on the due date or not at all (an invoice due on receipt, issued after the morning's run)
    ['2027-02-05', [{ step: 'before:3' }], null],
    ['2027-02-04', [{ step: 'before:3' }], { step: 'due', on: '2027-02-04', skipped: [] }],
    // the before step missed on its day still goes before the due date, and not on it
    ['2027-02-02', [], { step: 'before:3', on: '2027-02-01', skipped: [] }],
    ['2027-02-04', [], { step: 'due', on: '2027-02-04', skipped: [] }],
    // an after-due step sent under an older cadence: no before or due reminder after it
    ['2027-02-04', [{ step: 'after:1' }], null],
    ['2027-01-31', [], null],
  ])('on %s with %j sent → %j', (today, sent, expected) => expect(remindersDue({ cadence: weekly, dueOn, today, sent })).toEqual(expected));

  it('names the bad field', () => {
    expectInputError(() => reminderSteps({ ...weekly, daysBefore: 0 }, dueOn), 'cadence.daysBefore');
    expectInputError(() => reminderSteps({ ...weekly, everyDaysAfter: 1.5 }, dueOn), 'cadence.everyDaysAfter');
    expectInputError(() => reminderSteps({ ...weekly, maxAfter: -1 }, dueOn), 'cadence.maxAfter');
    expectInputError(() => reminderSteps(weekly, '2027-13-01'), 'dueOn');
    expectInputError(() => remindersDue({ cadence: weekly, dueOn, today: 'soon', sent: [] }), 'today');
    expectInputError(() => remindersDue({ cadence: weekly, dueOn, today: dueOn, sent: [{ step: 'after:0' }] }), 'sent[0].step');
  });
});
