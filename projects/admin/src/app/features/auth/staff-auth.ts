import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, firstValueFrom } from 'rxjs';
import type {
  InvitationAccept,
  PasswordResetComplete,
  PasswordResetRequest,
  SignInRequest,
  SignUpConfirm,
  SignUpRequest,
  StaffSession,
} from '@layerbook/contracts/types';
import { Session } from '../../core/auth/session';

/** The staff sign-in calls. Each one that signs someone in hands the new session to `Session`. */
@Injectable({ providedIn: 'root' })
export class StaffAuth {
  private readonly http = inject(HttpClient);
  private readonly session = inject(Session);

  signIn(body: SignInRequest): Promise<void> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/signin', body));
  }

  /** Sends the confirmation e-mail; the firm is opened by `confirmSignUp` with the link's code. */
  async signUp(body: SignUpRequest): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/signup', body));
  }

  confirmSignUp(body: SignUpConfirm): Promise<void> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/signup/confirm', body));
  }

  async requestPasswordReset(body: PasswordResetRequest): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/password-reset', body));
  }

  completePasswordReset(body: PasswordResetComplete): Promise<void> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/password-reset/complete', body));
  }

  acceptInvitation(body: InvitationAccept): Promise<void> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/invitations/accept', body));
  }

  private async signedIn(call: Observable<StaffSession>): Promise<void> {
    this.session.accept(await firstValueFrom(call));
  }
}
