import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { ProjectsApi, type PortalProject } from './projects-api';

@Component({
  selector: 'lb-projects',
  imports: [MatIconModule, MatProgressBarModule],
  template: `
    <h1>Your projects</h1>
    @if (client(); as me) {
      <p class="lb-lead">Proposals, sample boards, invoices and receipts from {{ me.firmName }}.</p>
    }
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading your projects" />
    } @else if (loadMessage(); as message) {
      <p class="lb-form-alert" role="alert">{{ message }}</p>
    } @else if (projects().length === 0) {
      <div class="empty">
        <mat-icon aria-hidden="true">folder_open</mat-icon>
        <p>
          Nothing here yet. When your firm sends you a proposal or an invoice, it will appear on
          this page and you will get an e-mail too.
        </p>
      </div>
    } @else {
      <ul class="list">
        @for (project of projects(); track project.id) {
          <li>{{ project.title }}</li>
        }
      </ul>
    }
  `,
  styles: `
    .empty {
      display: flex;
      gap: 1rem;
      align-items: flex-start;
      max-width: 40rem;
      padding: 1.25rem 1.5rem;
      border: 2px dashed var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    .empty p { margin: 0; }
    .empty mat-icon { color: var(--lb-verdigris); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Projects {
  private readonly api = inject(ProjectsApi);

  protected readonly client = inject(Session).client;
  protected readonly projects = signal<readonly PortalProject[]>([]);
  protected readonly isLoading = signal(true);
  protected readonly loadMessage = signal<string | null>(null);

  constructor() {
    void this.load();
  }

  private async load(): Promise<void> {
    try {
      this.projects.set(await this.api.list());
    } catch (error) {
      this.loadMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
