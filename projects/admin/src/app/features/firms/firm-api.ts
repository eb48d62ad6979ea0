import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { FirmSettings, FirmSettingsUpdate } from '@layerbook/contracts';

@Injectable({ providedIn: 'root' })
export class FirmApi {
  private readonly http = inject(HttpClient);

  load(): Promise<FirmSettings> {
    return firstValueFrom(this.http.get<FirmSettings>('/api/firm'));
  }

  save(update: FirmSettingsUpdate): Promise<FirmSettings> {
    return firstValueFrom(this.http.patch<FirmSettings>('/api/firm', update));
  }
}
