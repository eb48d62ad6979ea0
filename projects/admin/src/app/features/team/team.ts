import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import {
  MEMBER_STATUS_LABELS,
  STAFF_ROLES,
  STAFF_ROLE_LABELS,
  type ItemList,
  type StaffRole,
  type TeamInvitation,
  type TeamMember,
} from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import { Session } from '../../core/auth/session';
import { problemMessage } from '../../core/errors/problem';
import { loadMessage } from '../../shared/forms/load-message';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { InviteForm } from './invite-form';
import { TeamApi } from './team-api';

@Component({
  selector: 'lb-team',
  imports: [DatePipe, FormAlert, InviteForm, MatButtonModule, MatIconModule, MatProgressBarModule, MatSelectModule],
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
  protected readonly roleLabels = STAFF_ROLE_LABELS;
  protected readonly statusLabels = MEMBER_STATUS_LABELS;

  private readonly memberList = httpResource<ItemList<TeamMember>>(() => '/api/team/members');
  private readonly invitationList = httpResource<ItemList<TeamInvitation>>(() => '/api/team/invitations');
  protected readonly members = computed(() => (this.memberList.hasValue() ? this.memberList.value().items : []));
  protected readonly pendingInvitations = computed(() =>
    this.invitationList.hasValue() ? this.invitationList.value().items.filter((invitation) => invitation.status === 'pending') : [],
  );
  protected readonly hasMembers = computed(() => this.memberList.hasValue());
  protected readonly isLoading = computed(() => !this.hasMembers() && this.memberList.isLoading());
  private readonly actionMessage = signal<string | null>(null);
  private readonly membersMessage = loadMessage(this.memberList);
  private readonly invitationsMessage = loadMessage(this.invitationList);
  protected readonly pageMessage = computed(() => this.membersMessage() ?? this.invitationsMessage() ?? this.actionMessage());

  protected async changeRole(select: MatSelect, member: TeamMember, role: StaffRole): Promise<void> {
    const changed = await this.act(() => this.api.changeRole(member.id, role), `${member.name} is now ${STAFF_ROLE_LABELS[role]}.`);
    if (!changed) {
      // The list reloads with the same role, which would leave the refused choice showing.
      select.writeValue(member.role);
    }
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
      message: `${member.name} will be able to sign in again as ${STAFF_ROLE_LABELS[member.role]}.`,
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

  protected showInvitation(invitation: TeamInvitation): void {
    this.snackBar.open(`Invitation sent to ${invitation.email}.`, 'Close', { duration: 5000 });
    this.invitationList.reload();
  }

  /** Runs one change, then reloads so the page shows what the server holds. True when it was made. */
  private async act(change: () => Promise<unknown>, done: string): Promise<boolean> {
    this.actionMessage.set(null);
    let isDone = false;
    try {
      await change();
      this.snackBar.open(done, 'Close', { duration: 5000 });
      isDone = true;
    } catch (error) {
      this.actionMessage.set(problemMessage(error));
    }
    this.memberList.reload();
    this.invitationList.reload();
    return isDone;
  }

  private async confirm(data: ConfirmDialogData): Promise<boolean> {
    const ref = this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '28rem' });
    return (await firstValueFrom(ref.afterClosed())) === true;
  }
}
