import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { PortalLinkRequest, PortalRedeemRequest, PortalSession } from '@layerbook/contracts/types';
import { Session } from '../../core/auth/session';
import { inPortalWordsError } from '../../core/errors/problem';

/** Clients sign in with a one-time link sent by e-mail; there are no client passwords. */
@Injectable({ providedIn: 'root' })
export class PortalAuth {
  private readonly http = inject(HttpClient);
  private readonly session = inject(Session);

  /** A refusal is thrown in the portal's words: the shared e-mail-me-a-link form shows it as it is. */
  async requestLink(body: PortalLinkRequest): Promise<void> {
    try {
      await firstValueFrom(this.http.post('/api/portal/auth/link', body));
    } catch (error) {
      throw inPortalWordsError(error);
    }
  }

  async redeem(body: PortalRedeemRequest): Promise<void> {
    this.session.accept(await firstValueFrom(this.http.post<PortalSession>('/api/portal/auth/redeem', body)));
  }
}
