import { AbstractControl, FormControl, FormGroup, ValidationErrors, Validators } from '@angular/forms';
import {
  PROPOSAL_EXCLUSION_MAX,
  PROPOSAL_EXCLUSIONS_MAX,
  PROPOSAL_TEXT_MAX,
  type Problem,
  type ProposalSnapshot,
  type ProposalUpdate,
} from '@layerbook/contracts/types';
import { DATE_YEAR_WORDS, dateYearInRange, fromIsoDate, toIsoDate } from '../../shared/forms/iso-date';
import { DEFAULT_EXCLUSIONS, DEFAULT_TERMS_TEXT, DEFAULT_VALID_DAYS } from './proposal-words';

export const MAX_EXCLUSIONS = PROPOSAL_EXCLUSIONS_MAX;
const MAX_EXCLUSION_LENGTH = PROPOSAL_EXCLUSION_MAX;
export const MAX_TEXT = PROPOSAL_TEXT_MAX;

/** Mirrors packages/contracts/src/proposals/proposal.ts so both sides say the same. */
export const PROPOSAL_WORDS = {
  expiresOn: {
    required: 'Enter the last day the offer stands.',
    matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.',
    afterToday: 'Choose a day after today.',
    ...DATE_YEAR_WORDS,
  },
  percent: {
    required: 'Enter a whole percentage.',
    min: 'Cannot be negative.',
    max: 'At most 100 %.',
    whole: 'Use a whole percentage.',
    over100: 'The deposit and the progress payment add up to more than 100 %.',
  },
  text: { maxlength: `Use at most ${MAX_TEXT} characters.` },
  exclusions: {
    tooMany: `At most ${MAX_EXCLUSIONS} exclusions, one per line.`,
    tooLong: `Keep each exclusion to ${MAX_EXCLUSION_LENGTH} characters.`,
  },
} as const;

function whole(control: AbstractControl<number | null>): ValidationErrors | null {
  const v = control.value;
  return v === null || Number.isInteger(v) ? null : { whole: true };
}

function afterToday(control: AbstractControl<Date | null>): ValidationErrors | null {
  const day = toIsoDate(control.value);
  return day === null || day > toIsoDate(new Date())! ? null : { afterToday: true };
}

function exclusionLines(control: AbstractControl<string>): ValidationErrors | null {
  const lines = toLines(control.value ?? '');
  if (lines.length > MAX_EXCLUSIONS) return { tooMany: true };
  return lines.some((line) => line.length > MAX_EXCLUSION_LENGTH) ? { tooLong: true } : null;
}

/** Deposit plus progress payment may not pass 100 %: marked on the progress field, as the server does. */
function withinWhole(group: AbstractControl<{ depositPercent: number | null; progressPercent: number | null }>): ValidationErrors | null {
  const progress = group.get('progressPercent');
  const sum = (group.get('depositPercent')?.value ?? 0) + (progress?.value ?? 0);
  if (!progress) return null;
  const { over100: _gone, ...rest } = progress.errors ?? {};
  if (sum > 100) {
    progress.setErrors({ ...rest, over100: true });
  } else if (progress.hasError('over100')) {
    progress.setErrors(Object.keys(rest).length ? rest : null);
  }
  return null;
}

const percent = (value: number) =>
  new FormControl<number | null>(value, { validators: [Validators.required, Validators.min(0), Validators.max(100), whole] });

export function proposalForm() {
  const expires = new Date();
  expires.setDate(expires.getDate() + DEFAULT_VALID_DAYS);
  return new FormGroup({
    expiresOn: new FormControl<Date | null>(expires, { validators: [Validators.required, dateYearInRange, afterToday] }),
    terms: new FormGroup(
      {
        depositPercent: percent(30),
        progressPercent: percent(40),
        text: new FormControl(DEFAULT_TERMS_TEXT, { nonNullable: true, validators: [Validators.maxLength(MAX_TEXT)] }),
      },
      { validators: [withinWhole] },
    ),
    exclusions: new FormControl(DEFAULT_EXCLUSIONS.join('\n'), { nonNullable: true, validators: [exclusionLines] }),
    notes: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(MAX_TEXT)] }),
  });
}

export type ProposalForm = ReturnType<typeof proposalForm>;

export function toLines(typed: string): string[] {
  return typed
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter((line) => line !== '');
}

/** The body for both create (plus estimateId) and update: every field, as the office sees them. */
export function readProposal(form: ProposalForm): Required<ProposalUpdate> {
  const v = form.getRawValue();
  return {
    expiresOn: toIsoDate(v.expiresOn) ?? '',
    terms: { depositPercent: v.terms.depositPercent ?? 0, progressPercent: v.terms.progressPercent ?? 0, text: v.terms.text.trim() },
    exclusions: toLines(v.exclusions),
    notes: v.notes.trim(),
  };
}

/**
 * A new version starts with the estimate's notes for the client in its Notes box, as the builder
 * promises; the office may change or clear them for this version.
 */
export function startNewProposal(form: ProposalForm, clientNotes: string | undefined): void {
  form.controls.notes.reset(clientNotes ?? '');
}

/** A draft's stored choices back into the form, for editing. */
export function fillProposal(form: ProposalForm, snapshot: ProposalSnapshot): void {
  form.reset({
    expiresOn: fromIsoDate(snapshot.expiresOn),
    terms: { depositPercent: snapshot.terms.depositPercent, progressPercent: snapshot.terms.progressPercent, text: snapshot.terms.text },
    exclusions: snapshot.exclusions.join('\n'),
    notes: snapshot.notes,
  });
}

/**
 * The server names an exclusion by its line ("exclusions.2"); the form has one box for all lines,
 * so the message goes there, saying which line.
 */
export function placeExclusionErrors(problem: Problem): Problem {
  if (!problem.errors) return problem;
  return {
    ...problem,
    errors: problem.errors.map(({ field, message }) => {
      const line = /^exclusions\.(\d+)$/.exec(field);
      return line ? { field: 'exclusions', message: `Exclusion ${Number(line[1]) + 1}: ${message}` } : { field, message };
    }),
  };
}
