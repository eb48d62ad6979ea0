import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  EstimatingSettings,
  EstimatingSettingsView,
  FirmSettings,
  FirmSettingsUpdate,
  ItemList,
  StageLikelihood,
  StageLikelihoodUpdate,
} from '@layerbook/contracts/types';

/** The owner's saves on the settings page; what it shows is read by resources there. */
@Injectable({ providedIn: 'root' })
export class FirmApi {
  private readonly http = inject(HttpClient);

  saveProfile(update: FirmSettingsUpdate): Promise<FirmSettings> {
    return firstValueFrom(this.http.patch<FirmSettings>('/api/firm', update));
  }

  saveEstimating(settings: EstimatingSettings): Promise<EstimatingSettingsView> {
    return firstValueFrom(this.http.put<EstimatingSettingsView>('/api/firm/estimating', settings));
  }

  saveStageLikelihoods(body: StageLikelihoodUpdate): Promise<ItemList<StageLikelihood>> {
    return firstValueFrom(this.http.put<ItemList<StageLikelihood>>('/api/inquiries/stages', body));
  }
}
