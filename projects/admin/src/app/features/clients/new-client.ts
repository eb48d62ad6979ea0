import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { ClientSummary } from '@layerbook/contracts/types';
import { ClientForm } from './client-form';

@Component({
  selector: 'lb-new-client',
  imports: [ClientForm, RouterLink, TranslatePipe],
  template: `
    <section class="lb-page">
      <p>
        <a routerLink="/clients">{{ 'clients.backToClients' | translate }}</a>
      </p>
      <h1>{{ 'clients.newClient.heading' | translate }}</h1>
      <p class="lb-lead">{{ 'clients.newClient.lead' | translate }}</p>
      <lb-client-form (saved)="openClient($event)" (cancelled)="goBack()" />
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewClient {
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  protected async openClient(client: ClientSummary): Promise<void> {
    this.snackBar.open(
      String(this.translate.instant('clients.newClient.added', { name: client.name })),
      String(this.translate.instant('clients.close')),
      {
        duration: 4000,
      },
    );
    await this.router.navigate(['/clients', client.id]);
  }

  protected goBack(): void {
    void this.router.navigateByUrl('/clients');
  }
}
