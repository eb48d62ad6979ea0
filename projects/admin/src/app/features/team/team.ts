import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import {
  STAFF_ROLES,
  type ItemList,
  type Language as LanguageCode,
  type StaffRole,
  type TeamInvitation,
  type TeamMember,
} from '@layerbook/contracts/types';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { firstValueFrom } from 'rxjs';
import { LbDatePipe } from '../../../../../shared/i18n/format';
import { Session } from '../../core/auth/session';
import { problemMessage } from '../../core/errors/problem';
import { loadMessage } from '../../shared/forms/load-message';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { InviteForm } from './invite-form';
import { TeamApi } from './team-api';

@Component({
  selector: 'lb-team',
  imports: [FormAlert, LbDatePipe, TranslatePipe, InviteForm, MatButtonModule, MatIconModule, MatProgressBarModule, MatSelectModule],
  templateUrl: './team.html',
  styleUrl: './team.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Team {
  private readonly api = inject(TeamApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly roles = STAFF_ROLES;
  /** A member's own language, or null to follow the firm's (language names are each language's own). */
  protected readonly languageChoices: readonly { value: LanguageCode | null; label: string }[] = [
    { value: null, label: 'team.team.firmLanguage' },
    { value: 'en', label: 'common.languageNames.en' },
    { value: 'es', label: 'common.languageNames.es' },
  ];

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
    const changed = await this.act(
      () => this.api.changeRole(member.id, role),
      this.words('team.team.roleChanged', { name: member.name, role: this.roleLabel(role) }),
    );
    if (!changed) {
      // The list reloads with the same role, which would leave the refused choice showing.
      select.writeValue(member.role);
    }
  }

  protected async changeLanguage(select: MatSelect, member: TeamMember, language: LanguageCode | null): Promise<void> {
    const changed = await this.act(
      () => this.api.changeLanguage(member.id, language),
      this.words('team.team.languageChanged', { name: member.name }),
    );
    if (!changed) select.writeValue(member.language);
  }

  protected async deactivate(member: TeamMember): Promise<void> {
    const confirmed = await this.confirm({
      title: 'team.team.deactivateTitle',
      message: 'team.team.deactivateMessage',
      confirmLabel: 'team.team.deactivate',
      params: { name: member.name },
    });
    if (confirmed) {
      await this.act(() => this.api.deactivate(member.id), this.words('team.team.deactivated', { name: member.name }));
    }
  }

  protected async reactivate(member: TeamMember): Promise<void> {
    const confirmed = await this.confirm({
      title: 'team.team.reactivateTitle',
      message: 'team.team.reactivateMessage',
      confirmLabel: 'team.team.reactivate',
      params: { name: member.name, role: this.roleLabel(member.role) },
    });
    if (confirmed) {
      await this.act(() => this.api.reactivate(member.id), this.words('team.team.reactivated', { name: member.name }));
    }
  }

  /** Owner and office may have a second factor to lose (crew are never asked for one). */
  protected mayHaveSecondFactor(member: TeamMember): boolean {
    return member.status === 'active' && member.hasSecondFactor;
  }

  protected async clearSecondFactor(member: TeamMember): Promise<void> {
    const confirmed = await this.confirm({
      title: 'team.team.clearFactorTitle',
      message: 'team.team.clearFactorMessage',
      confirmLabel: 'team.team.clearFactor',
      params: { name: member.name },
    });
    if (confirmed) {
      await this.act(() => this.api.clearSecondFactor(member.id), this.words('team.team.factorCleared', { name: member.name }));
    }
  }

  protected async revoke(invitation: TeamInvitation): Promise<void> {
    const confirmed = await this.confirm({
      title: 'team.team.revokeTitle',
      message: 'team.team.revokeMessage',
      confirmLabel: 'team.team.revoke',
      params: { email: invitation.email },
    });
    if (confirmed) {
      await this.act(() => this.api.revoke(invitation.id), this.words('team.team.revoked', { email: invitation.email }));
    }
  }

  protected showInvitation(invitation: TeamInvitation): void {
    this.snackBar.open(this.words('team.team.invitationSent', { email: invitation.email }), this.words('team.team.close'), {
      duration: 5000,
    });
    this.invitationList.reload();
  }

  /** Runs one change, then reloads so the page shows what the server holds. True when it was made. */
  private async act(change: () => Promise<unknown>, done: string): Promise<boolean> {
    this.actionMessage.set(null);
    let isDone = false;
    try {
      await change();
      this.snackBar.open(done, this.words('team.team.close'), { duration: 5000 });
      isDone = true;
    } catch (error) {
      this.actionMessage.set(problemMessage(error));
    }
    this.memberList.reload();
    this.invitationList.reload();
    return isDone;
  }

  private words(key: string, params?: Record<string, string>): string {
    return this.translate.instant(key, params) as string;
  }

  private roleLabel(role: StaffRole): string {
    return this.words(`ui.roles.${role}.label`);
  }

  private async confirm(data: ConfirmDialogData): Promise<boolean> {
    const ref = this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '28rem' });
    return (await firstValueFrom(ref.afterClosed())) === true;
  }
}
