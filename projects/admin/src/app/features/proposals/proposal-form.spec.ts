import type { Problem, ProposalSnapshot } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { MAX_EXCLUSIONS, fillProposal, placeExclusionErrors, proposalForm, readProposal, startNewProposal, toLines } from './proposal-form';

describe('toLines', () => {
  it.each([
    ['one\ntwo', ['one', 'two']],
    ['  padded  \r\n\n  \nlast', ['padded', 'last']],
    ['', []],
  ])('%j → %j', (typed, lines) => {
    expect(toLines(typed)).toEqual(lines);
  });
});

describe('the proposal form', () => {
  it('reads every field as the API takes it, trimmed and one exclusion per line', () => {
    const form = proposalForm();
    form.setValue({
      expiresOn: new Date(2026, 11, 31),
      terms: { depositPercent: 25, progressPercent: 50, text: '  Net 14 days. ' },
      exclusions: 'Moving furniture\n\n Repairs to the plaster beneath ',
      notes: ' Access by the side gate. ',
    });
    expect(readProposal(form)).toEqual({
      expiresOn: '2026-12-31',
      terms: { depositPercent: 25, progressPercent: 50, text: 'Net 14 days.' },
      exclusions: ['Moving furniture', 'Repairs to the plaster beneath'],
      notes: 'Access by the side gate.',
    });
  });

  it.each([
    ['We cover floors daily.', 'We cover floors daily.'],
    [undefined, ''],
  ])("starts a new version with the estimate's notes for the client (%j → %j)", (clientNotes, notes) => {
    const form = proposalForm();
    startNewProposal(form, clientNotes);
    expect(readProposal(form).notes).toBe(notes);
  });

  it('puts a draft back into the form', () => {
    const form = proposalForm();
    const snapshot = {
      expiresOn: '2027-01-15',
      terms: { depositPercent: 10, progressPercent: 40, text: 'T' },
      exclusions: ['A', 'B'],
      notes: 'N',
    } as Partial<ProposalSnapshot>;
    fillProposal(form, snapshot as ProposalSnapshot);
    expect(readProposal(form)).toEqual({
      expiresOn: '2027-01-15',
      terms: { depositPercent: 10, progressPercent: 40, text: 'T' },
      exclusions: ['A', 'B'],
      notes: 'N',
    });
  });

  it('marks the progress payment when the two payments pass 100 %, and clears it again', () => {
    const form = proposalForm();
    const progress = form.controls.terms.controls.progressPercent;
    form.controls.terms.patchValue({ depositPercent: 70, progressPercent: 40 });
    expect(progress.hasError('over100')).toBe(true);
    form.controls.terms.patchValue({ progressPercent: 30 });
    expect(progress.hasError('over100')).toBe(false);
  });

  it(`refuses more than ${MAX_EXCLUSIONS} exclusions`, () => {
    const form = proposalForm();
    form.controls.exclusions.setValue(Array.from({ length: MAX_EXCLUSIONS + 1 }, (_, i) => `Item ${i}`).join('\n'));
    expect(form.controls.exclusions.hasError('tooMany')).toBe(true);
  });
});

describe('placeExclusionErrors', () => {
  it('moves a line-numbered exclusion error onto the one box, saying which line', () => {
    const problem: Problem = {
      type: 'about:blank',
      title: 'The request has invalid fields',
      status: 400,
      errors: [
        { field: 'exclusions.2', message: 'Write the exclusion or remove the line.' },
        { field: 'notes', message: 'Use at most 4000 characters.' },
      ],
    };
    expect(placeExclusionErrors(problem).errors).toEqual([
      { field: 'exclusions', message: 'Exclusion 3: Write the exclusion or remove the line.' },
      { field: 'notes', message: 'Use at most 4000 characters.' },
    ]);
  });

  it('leaves a problem without field errors as it is', () => {
    const problem: Problem = { type: 'about:blank', title: 'Conflict', status: 409 };
    expect(placeExclusionErrors(problem)).toBe(problem);
  });
});
