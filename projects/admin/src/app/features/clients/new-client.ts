import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import type { ClientSummary } from '@layerbook/contracts/types';
import { ClientForm } from './client-form';

@Component({
  selector: 'lb-new-client',
  imports: [ClientForm, RouterLink],
  template: `
    <section class="lb-page">
      <p><a routerLink="/clients">Back to clients</a></p>
      <h1>Add a client</h1>
      <p class="lb-lead">Add their people and sites on the next page.</p>
      <lb-client-form (saved)="openClient($event)" (cancelled)="goBack()" />
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewClient {
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);

  protected async openClient(client: ClientSummary): Promise<void> {
    this.snackBar.open(`${client.name} added.`, 'Close', { duration: 4000 });
    await this.router.navigate(['/clients', client.id]);
  }

  protected goBack(): void {
    void this.router.navigateByUrl('/clients');
  }
}
