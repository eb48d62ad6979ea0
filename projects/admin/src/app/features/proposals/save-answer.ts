import type { Problem } from '@layerbook/contracts/types';

/**
 * What the builder does with a save's answer. The form stays editable while a save runs: when nothing
 * was typed since the save started, the form is refilled from the answer (the server's own copy); when
 * something was, the typing is kept and the form stays "unsaved", measured against what was sent.
 */
export function afterSaveAnswer(sentForm: string, formNow: string): 'refill' | 'keepTyped' {
  return sentForm === formNow ? 'refill' : 'keepTyped';
}

/** A save refused because someone else saved the estimate after it was loaded (409 naming `computedAt`). */
export function isSavedByOther(problem: Problem): boolean {
  return problem.status === 409 && (problem.errors ?? []).some((e) => e.field === 'computedAt');
}
