import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { SampleBoardListItem } from '@layerbook/contracts/types';
import { LbDatePipe } from '../../../../../shared/i18n/format';
import { Session } from '../../core/auth/session';
import { keysetList } from '../../shared/forms/keyset-list';
import { FormAlert } from '../../shared/ui/form-alert';
import { SAMPLES_URL } from './sample-api';
import { STATUS_WORDS } from './status-words';

const PAGE_SIZE = 50;

/** Every sample board of the firm, newest first, a page at a time, with its status in words and a first photo. */
@Component({
  selector: 'lb-sample-list',
  imports: [FormAlert, LbDatePipe, MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, TranslatePipe],
  template: `
    <section class="lb-page">
      <div class="heading">
        <h1>{{ 'samples.list.title' | translate }}</h1>
        @if (canWrite()) {
          <a mat-flat-button routerLink="/samples/new">
            <mat-icon aria-hidden="true">add</mat-icon>
            {{ 'samples.list.new' | translate }}
          </a>
        }
      </div>
      <p class="lb-lead">{{ 'samples.list.lead' | translate }}</p>

      <lb-form-alert [message]="list.message()" />
      @if (list.isLoading()) {
        <mat-progress-bar mode="indeterminate" [attr.aria-label]="'samples.list.loading' | translate" />
      }

      <div class="table-wrap" tabindex="0" role="region" [attr.aria-label]="'samples.list.table' | translate">
        <table [attr.aria-label]="'samples.list.table' | translate">
          <thead>
            <tr>
              <th scope="col">
                <span class="cdk-visually-hidden">{{ 'samples.list.photo' | translate }}</span>
              </th>
              <th scope="col">{{ 'samples.list.label' | translate }}</th>
              <th scope="col">{{ 'samples.list.client' | translate }}</th>
              <th scope="col">{{ 'samples.list.round' | translate }}</th>
              <th scope="col">{{ 'samples.list.status' | translate }}</th>
              <th scope="col">{{ 'samples.list.made' | translate }}</th>
            </tr>
          </thead>
          <tbody>
            @for (board of list.items(); track board.id) {
              <tr>
                <td class="thumb">
                  @if (board.coverThumbnailUrl) {
                    <img
                      [src]="board.coverThumbnailUrl"
                      [alt]="'samples.list.photoOf' | translate: { label: board.label }"
                      width="64"
                      height="48"
                      loading="lazy"
                      decoding="async"
                    />
                  } @else {
                    <mat-icon aria-hidden="true" class="no-photo">photo_camera</mat-icon>
                  }
                </td>
                <th scope="row">
                  <a [routerLink]="['/samples', board.id]">{{ board.label }}</a>
                </th>
                <td>{{ board.clientName }}</td>
                <td>{{ board.round }}</td>
                <td>
                  <span class="status">
                    <mat-icon aria-hidden="true">{{ words[board.status].icon }}</mat-icon>
                    {{ words[board.status].key | translate }}
                  </span>
                </td>
                <td>{{ board.createdAt | lbDate: 'medium' : null }}</td>
              </tr>
            } @empty {
              @if (!list.isLoading()) {
                <tr>
                  <td colspan="6" class="none">{{ 'samples.list.empty' | translate }}</td>
                </tr>
              }
            }
          </tbody>
        </table>
      </div>
      @if (list.hasMore()) {
        <button mat-stroked-button type="button" class="more" (click)="list.loadMore()" [disabled]="list.isLoadingMore()">
          {{ 'samples.list.more' | translate }}
        </button>
      }
    </section>
  `,
  styles: `
    .heading {
      display: flex;
      align-items: center;
      justify-content: space-between;
      gap: 1rem;
      flex-wrap: wrap;
    }
    .table-wrap {
      overflow-x: auto;
    }
    table {
      width: 100%;
      border-collapse: collapse;
    }
    th,
    td {
      text-align: left;
      padding: 0.5rem;
      border-bottom: 1px solid var(--lb-line, #d9cfbf);
      vertical-align: middle;
    }
    .thumb img {
      display: block;
      object-fit: cover;
      border-radius: 4px;
    }
    .no-photo {
      opacity: 0.5;
    }
    .status {
      display: inline-flex;
      align-items: center;
      gap: 0.35rem;
    }
    .none {
      padding: 1.5rem 0.5rem;
    }
    .more {
      margin-top: 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SampleList {
  private readonly session = inject(Session);
  protected readonly list = keysetList<SampleBoardListItem>(SAMPLES_URL, () => ({ limit: PAGE_SIZE }));

  protected readonly words = STATUS_WORDS;
  protected readonly canWrite = () => this.session.hasRole('office');
}
