import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  InvitationCreate,
  Language,
  LanguageChoice,
  MemberRoleUpdate,
  StaffRole,
  TeamInvitation,
  TeamMember,
} from '@layerbook/contracts/types';

/** The owner's changes to the team; the lists are resources in the team page. */
@Injectable({ providedIn: 'root' })
export class TeamApi {
  private readonly http = inject(HttpClient);

  invite(body: InvitationCreate): Promise<TeamInvitation> {
    return firstValueFrom(this.http.post<TeamInvitation>('/api/team/invitations', body));
  }

  async revoke(invitationId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/team/invitations/${encodeURIComponent(invitationId)}`));
  }

  changeRole(memberId: string, role: StaffRole): Promise<TeamMember> {
    const body: MemberRoleUpdate = { role };
    return firstValueFrom(this.http.patch<TeamMember>(memberUrl(memberId), body));
  }

  /** The member's e-mails and screens in this language; null follows the firm's (owner only). */
  changeLanguage(memberId: string, language: Language | null): Promise<TeamMember> {
    const body: LanguageChoice = { language };
    return firstValueFrom(this.http.patch<TeamMember>(`${memberUrl(memberId)}/language`, body));
  }

  deactivate(memberId: string): Promise<TeamMember> {
    return firstValueFrom(this.http.post<TeamMember>(`${memberUrl(memberId)}/deactivate`, {}));
  }

  reactivate(memberId: string): Promise<TeamMember> {
    return firstValueFrom(this.http.post<TeamMember>(`${memberUrl(memberId)}/reactivate`, {}));
  }

  /** Clears a member's lost second factor (owner only; by membership id, as the list gives it). */
  async clearSecondFactor(memberId: string): Promise<void> {
    await firstValueFrom(this.http.post(`/api/auth/second-factor/members/${encodeURIComponent(memberId)}/reset`, {}));
  }
}

function memberUrl(id: string): string {
  return `/api/team/members/${encodeURIComponent(id)}`;
}
