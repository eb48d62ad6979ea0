import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { firstValueFrom } from 'rxjs';
import type { StaffRole, TeamInvitation, TeamMember, TeamView } from '@layerbook/contracts';
import { STAFF_ROLES } from '../../core/auth/roles';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { ROLE_WORDS } from '../../shared/ui/role-words';
import { InviteForm } from './invite-form';
import { TeamApi } from './team-api';

@Component({
  selector: 'lb-team',
  imports: [
    DatePipe,
    FormAlert,
    InviteForm,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
  ],
  templateUrl: './team.html',
  styleUrl: './team.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Team {
  private readonly api = inject(TeamApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly roles = STAFF_ROLES;
  protected readonly roleWords = ROLE_WORDS;
  protected readonly view = signal<TeamView | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly pageMessage = signal<string | null>(null);
  protected readonly pendingInvitations = computed(
    () => this.view()?.invitations.filter((invitation) => invitation.status === 'pending') ?? [],
  );

  constructor() {
    void this.reload();
  }

  protected async changeRole(member: TeamMember, role: StaffRole): Promise<void> {
    await this.act(
      () => this.api.changeRole(member.id, role),
      `${member.name} is now ${ROLE_WORDS[role].label}.`,
    );
  }

  protected async deactivate(member: TeamMember): Promise<void> {
    const confirmed = await this.confirm({
      title: `Deactivate ${member.name}?`,
      message: `${member.name} will no longer be able to sign in. Their work stays in Layerbook, and you can reactivate them later.`,
      confirmLabel: 'Deactivate',
    });
    if (confirmed) {
      await this.act(() => this.api.deactivate(member.id), `${member.name} is deactivated.`);
    }
  }

  protected async reactivate(member: TeamMember): Promise<void> {
    const confirmed = await this.confirm({
      title: `Reactivate ${member.name}?`,
      message: `${member.name} will be able to sign in again as ${ROLE_WORDS[member.role].label}.`,
      confirmLabel: 'Reactivate',
    });
    if (confirmed) {
      await this.act(() => this.api.reactivate(member.id), `${member.name} can sign in again.`);
    }
  }

  protected async revoke(invitation: TeamInvitation): Promise<void> {
    const confirmed = await this.confirm({
      title: 'Revoke this invitation?',
      message: `The link sent to ${invitation.email} will stop working. You can invite them again later.`,
      confirmLabel: 'Revoke',
    });
    if (confirmed) {
      await this.act(() => this.api.revoke(invitation.id), `Invitation to ${invitation.email} revoked.`);
    }
  }

  protected async showInvitation(invitation: TeamInvitation): Promise<void> {
    this.snackBar.open(`Invitation sent to ${invitation.email}.`, 'Close', { duration: 5000 });
    await this.reload();
  }

  /** Runs one change, then reloads so the table shows what the server holds (or puts a refused role back). */
  private async act(change: () => Promise<unknown>, done: string): Promise<void> {
    this.pageMessage.set(null);
    try {
      await change();
      this.snackBar.open(done, 'Close', { duration: 5000 });
    } catch (error) {
      const problem = toProblem(error);
      this.pageMessage.set(problem.detail ?? problem.title);
    }
    await this.reload();
  }

  private async confirm(data: ConfirmDialogData): Promise<boolean> {
    const ref = this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, {
      data,
      width: '28rem',
    });
    return (await firstValueFrom(ref.afterClosed())) === true;
  }

  private async reload(): Promise<void> {
    try {
      this.view.set(await this.api.load());
    } catch (error) {
      this.pageMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
