import { HttpErrorResponse } from '@angular/common/http';
import { FormControl, FormGroup, Validators } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { Submission } from './submission';

function nameForm(name = 'Olive') {
  return new FormGroup({ name: new FormControl(name, { nonNullable: true, validators: Validators.required }) });
}

const refusal = (body: unknown, status = 400) => new HttpErrorResponse({ status, error: body });

describe('Submission', () => {
  it('sends a valid form and answers what the call gave', async () => {
    const submission = new Submission();
    expect(await submission.send(nameForm(), () => Promise.resolve('saved'))).toBe('saved');
    expect(submission.isBusy()).toBe(false);
    expect(submission.message()).toBeNull();
  });

  it('does not send an invalid form, and shows each field its error', async () => {
    const submission = new Submission();
    const form = nameForm('');
    let isCalled = false;
    expect(await submission.send(form, () => Promise.resolve((isCalled = true)))).toBeUndefined();
    expect(isCalled).toBe(false);
    expect(form.controls.name.touched).toBe(true);
  });

  it('is busy while the call runs', async () => {
    const submission = new Submission();
    let busyDuring = false;
    await submission.send(nameForm(), () => Promise.resolve((busyDuring = submission.isBusy())));
    expect(busyDuring).toBe(true);
  });

  it.each([
    [
      'a field error, beside its field',
      refusal({
        type: 'about:blank',
        title: 'Bad input',
        status: 400,
        errors: [{ field: 'name', message: 'Use at most 120 characters.' }],
      }),
      null,
      { server: 'Use at most 120 characters.' },
    ],
    [
      'an error on no field, at the top',
      refusal({ type: 'about:blank', title: 'Conflict', status: 409, detail: 'That person is already on the team.' }, 409),
      'That person is already on the team.',
      null,
    ],
    ['an unreachable server', refusal(null, 0), 'Layerbook could not be reached. Check your connection and try again.', null],
  ])('puts %s', async (_case, error, message, fieldErrors) => {
    const submission = new Submission();
    const form = nameForm();
    expect(await submission.send(form, () => Promise.reject(error as Error))).toBeUndefined();
    expect(submission.message()).toBe(message);
    expect(form.controls.name.errors).toEqual(fieldErrors);
    expect(submission.isBusy()).toBe(false);
  });

  it('clears the last message when sent again', async () => {
    const submission = new Submission();
    submission.say('Could not load.');
    await submission.send(nameForm(), () => Promise.resolve(1));
    expect(submission.message()).toBeNull();
  });
});
