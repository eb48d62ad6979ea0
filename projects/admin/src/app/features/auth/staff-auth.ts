import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, firstValueFrom } from 'rxjs';
import type {
  InvitationAccept,
  PasswordResetComplete,
  PasswordResetRequest,
  SignInRequest,
  SignUpConfirm,
  SecondFactorCheck,
  SignUpRequest,
  StaffSession,
} from '@layerbook/contracts/types';
import { urlAfterSignIn } from '../../core/auth/guards';
import { Session } from '../../core/auth/session';

/**
 * The staff sign-in calls. Each one that signs someone in hands the new session to `Session` and
 * answers where to go next (the second-factor step when one is asked).
 */
@Injectable({ providedIn: 'root' })
export class StaffAuth {
  private readonly http = inject(HttpClient);
  private readonly session = inject(Session);

  signIn(body: SignInRequest, next?: string): Promise<string> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/signin', body), next);
  }

  /** The code after the password: from the app, or a recovery code. */
  checkSecondFactor(body: SecondFactorCheck, next?: string): Promise<string> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/second-factor', body), next);
  }

  /** Sends the confirmation e-mail; the firm is opened by `confirmSignUp` with the link's code. */
  async signUp(body: SignUpRequest): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/signup', body));
  }

  confirmSignUp(body: SignUpConfirm): Promise<string> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/signup/confirm', body));
  }

  async requestPasswordReset(body: PasswordResetRequest): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/password-reset', body));
  }

  completePasswordReset(body: PasswordResetComplete): Promise<string> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/password-reset/complete', body));
  }

  acceptInvitation(body: InvitationAccept): Promise<string> {
    return this.signedIn(this.http.post<StaffSession>('/api/auth/invitations/accept', body));
  }

  private async signedIn(call: Observable<StaffSession>, next?: string): Promise<string> {
    const session = await firstValueFrom(call);
    this.session.accept(session);
    return urlAfterSignIn(session, next);
  }
}
