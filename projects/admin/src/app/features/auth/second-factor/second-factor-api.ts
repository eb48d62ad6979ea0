import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  FirmSecondFactor,
  RecoveryCodes,
  SecondFactorConfirm,
  SecondFactorEnrolled,
  SecondFactorEnrolment,
  SecondFactorEnrolmentStart,
  SecondFactorStatus,
  SecondFactorTurnOff,
} from '@layerbook/contracts/types';
import { Session } from '../../../core/auth/session';

export const SECOND_FACTOR_URL = '/api/auth/second-factor';

/** Setting up, renewing and turning off a second factor, and the owner's rule for the firm. Reads go through httpResource. */
@Injectable({ providedIn: 'root' })
export class SecondFactorApi {
  private readonly http = inject(HttpClient);
  private readonly session = inject(Session);

  /** Signed in, the password proves it is the person (`{ password }`); right after the password at sign-in, nothing more. */
  start(body: SecondFactorEnrolmentStart = {}): Promise<SecondFactorEnrolment> {
    return firstValueFrom(this.http.post<SecondFactorEnrolment>(`${SECOND_FACTOR_URL}/enrolment`, body));
  }

  /** The first code turns it on; the answer carries the recovery codes and the session (signed in after a set-up at sign-in). */
  async confirm(body: SecondFactorConfirm): Promise<SecondFactorEnrolled> {
    const answer = await firstValueFrom(this.http.post<SecondFactorEnrolled>(`${SECOND_FACTOR_URL}/enrolment/confirm`, body));
    this.session.accept(answer);
    return answer;
  }

  /** New codes, proved like turning off (the password, a code or a recovery code). */
  renewRecoveryCodes(proof: SecondFactorTurnOff): Promise<RecoveryCodes> {
    return firstValueFrom(this.http.post<RecoveryCodes>(`${SECOND_FACTOR_URL}/recovery-codes`, proof));
  }

  turnOff(body: SecondFactorTurnOff): Promise<SecondFactorStatus> {
    return firstValueFrom(this.http.post<SecondFactorStatus>(`${SECOND_FACTOR_URL}/turn-off`, body));
  }

  requireForFirm(body: FirmSecondFactor): Promise<SecondFactorStatus> {
    return firstValueFrom(this.http.put<SecondFactorStatus>(`${SECOND_FACTOR_URL}/firm`, body));
  }
}
