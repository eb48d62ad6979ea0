import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  InvitationCreate,
  StaffRole,
  TeamInvitation,
  TeamMember,
  TeamView,
} from '@layerbook/contracts';

@Injectable({ providedIn: 'root' })
export class TeamApi {
  private readonly http = inject(HttpClient);

  load(): Promise<TeamView> {
    return firstValueFrom(this.http.get<TeamView>('/api/team'));
  }

  invite(body: InvitationCreate): Promise<TeamInvitation> {
    return firstValueFrom(this.http.post<TeamInvitation>('/api/team/invitations', body));
  }

  async revoke(invitationId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/team/invitations/${encodeURIComponent(invitationId)}`));
  }

  changeRole(memberId: string, role: StaffRole): Promise<TeamMember> {
    return firstValueFrom(
      this.http.patch<TeamMember>(`/api/team/members/${encodeURIComponent(memberId)}`, { role }),
    );
  }

  deactivate(memberId: string): Promise<TeamMember> {
    return firstValueFrom(
      this.http.post<TeamMember>(`/api/team/members/${encodeURIComponent(memberId)}/deactivate`, {}),
    );
  }

  reactivate(memberId: string): Promise<TeamMember> {
    return firstValueFrom(
      this.http.post<TeamMember>(`/api/team/members/${encodeURIComponent(memberId)}/reactivate`, {}),
    );
  }
}
