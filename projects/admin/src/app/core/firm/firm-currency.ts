import { HttpClient } from '@angular/common/http';
import { Injectable, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { FirmSettings } from '@layerbook/contracts/types';

/** The firm's currency, asked once per visit, for pages that show estimated values. */
@Injectable({ providedIn: 'root' })
export class FirmCurrency {
  private readonly http = inject(HttpClient);
  private readonly current = signal<string | null>(null);
  private pending: Promise<void> | null = null;

  readonly code = this.current.asReadonly();

  /** Safe to call from every page: later calls share the first answer. */
  load(): Promise<void> {
    if (this.current()) {
      return Promise.resolve();
    }
    this.pending ??= firstValueFrom(this.http.get<FirmSettings>('/api/firm'))
      .then(
        (firm) => this.current.set(firm.currency),
        // Amounts still show as plain numbers without it; the page itself reports real failures.
        () => undefined,
      )
      .finally(() => (this.pending = null));
    return this.pending;
  }

  /** Pages that already know it (Today's pipeline) save a request. */
  remember(code: string): void {
    this.current.set(code);
  }
}
