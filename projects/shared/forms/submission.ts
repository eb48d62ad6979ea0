import { signal } from '@angular/core';
import { AbstractControl } from '@angular/forms';
import { applyProblem } from '../errors/apply-problem';
import { toProblem } from '../errors/problem';

/**
 * What every form that sends something keeps: whether it is sending, and what the server said
 * that no field shows. `send` checks the form first; the server's field errors go beside their
 * fields. Resolves to the answer, or undefined when nothing was sent or the server refused.
 */
export class Submission {
  private readonly busy = signal(false);
  private readonly said = signal<string | null>(null);

  readonly isBusy = this.busy.asReadonly();
  readonly message = this.said.asReadonly();

  async send<T>(form: AbstractControl, call: () => Promise<T>): Promise<T | undefined> {
    this.said.set(null);
    if (form.invalid) {
      form.markAllAsTouched();
      return undefined;
    }
    this.busy.set(true);
    try {
      return await call();
    } catch (error) {
      this.said.set(applyProblem(form, toProblem(error)));
      return undefined;
    } finally {
      this.busy.set(false);
    }
  }

  /** For a message that is not the server's (a load that failed before the form could be sent). */
  say(message: string | null): void {
    this.said.set(message);
  }
}
