import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  FIRM_LOGO_FIELD,
  type EstimatingSettings,
  type EstimatingSettingsView,
  type FirmSettings,
  type FirmSettingsUpdate,
  type ItemList,
  type StageLikelihood,
  type StageLikelihoodUpdate,
} from '@layerbook/contracts/types';

/** The owner's saves on the settings page; what it shows is read by resources there. */
@Injectable({ providedIn: 'root' })
export class FirmApi {
  private readonly http = inject(HttpClient);

  saveProfile(update: FirmSettingsUpdate): Promise<FirmSettings> {
    return firstValueFrom(this.http.patch<FirmSettings>('/api/firm', update));
  }

  uploadLogo(file: File): Promise<FirmSettings> {
    const form = new FormData();
    form.append(FIRM_LOGO_FIELD, file, file.name);
    return firstValueFrom(this.http.post<FirmSettings>('/api/firm/logo', form));
  }

  removeLogo(): Promise<FirmSettings> {
    return firstValueFrom(this.http.delete<FirmSettings>('/api/firm/logo'));
  }

  saveEstimating(settings: EstimatingSettings): Promise<EstimatingSettingsView> {
    return firstValueFrom(this.http.put<EstimatingSettingsView>('/api/firm/estimating', settings));
  }

  saveStageLikelihoods(body: StageLikelihoodUpdate): Promise<ItemList<StageLikelihood>> {
    return firstValueFrom(this.http.put<ItemList<StageLikelihood>>('/api/inquiries/stages', body));
  }
}
