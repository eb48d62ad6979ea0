import { Injectable, signal } from '@angular/core';

/** The CSRF token handed out by the last session answer; sent back on every state-changing request. */
@Injectable({ providedIn: 'root' })
export class CsrfToken {
  private readonly token = signal('');

  readonly value = this.token.asReadonly();

  remember(token: string): void {
    this.token.set(token);
  }
}
