import { inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import type { CanDeactivateFn } from '@angular/router';
import { map } from 'rxjs';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';

/** A page that can hold typing not yet saved. */
export interface HoldsUnsavedChanges {
  hasUnsavedChanges(): boolean;
}

/** Leaving a page with unsaved changes asks first; staying is the default answer. */
export const confirmLeaveUnsaved: CanDeactivateFn<HoldsUnsavedChanges> = (page) => {
  if (!page.hasUnsavedChanges()) return true;
  const data: ConfirmDialogData = {
    title: 'proposals.builder.leaveTitle',
    message: 'proposals.builder.leaveMessage',
    confirmLabel: 'proposals.builder.leaveConfirm',
  };
  return inject(MatDialog)
    .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '30rem' })
    .afterClosed()
    .pipe(map((answer) => answer === true));
};
