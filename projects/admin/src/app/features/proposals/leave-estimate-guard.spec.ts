import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import type { ActivatedRouteSnapshot, RouterStateSnapshot } from '@angular/router';
import { firstValueFrom, isObservable, of } from 'rxjs';
import { describe, expect, it, vi } from 'vitest';
import { confirmLeaveUnsaved } from './leave-estimate-guard';

function leave(hasUnsaved: boolean, answer: boolean | undefined) {
  const open = vi.fn(() => ({ afterClosed: () => of(answer) }));
  TestBed.configureTestingModule({ providers: [{ provide: MatDialog, useValue: { open } }] });
  const outcome = TestBed.runInInjectionContext(() =>
    confirmLeaveUnsaved(
      { hasUnsavedChanges: () => hasUnsaved },
      {} as ActivatedRouteSnapshot,
      {} as RouterStateSnapshot,
      {} as RouterStateSnapshot,
    ),
  );
  return { outcome, open };
}

describe('confirmLeaveUnsaved', () => {
  it('lets a saved page go without asking', () => {
    const { outcome, open } = leave(false, undefined);
    expect(outcome).toBe(true);
    expect(open).not.toHaveBeenCalled();
  });

  it.each([
    [true, true],
    [false, false],
    [undefined, false],
  ])('asks when there are unsaved changes: answer %s → leave %s', async (answer, expected) => {
    const { outcome, open } = leave(true, answer);
    expect(open).toHaveBeenCalledTimes(1);
    expect(open.mock.calls[0]).toBeDefined();
    expect(isObservable(outcome)).toBe(true);
    if (isObservable(outcome)) expect(await firstValueFrom(outcome)).toBe(expected);
  });
});
