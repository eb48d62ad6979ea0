import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { JobSheet, SheetRoom, SheetSurface, SheetSurfaceLayer } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { problemMessage } from '../../../core/errors/problem';
import { FormAlert } from '../../../shared/ui/form-alert';
import { formatDay, formatNumber, surfaceSizes, todayIn } from './sheet-format';
import { type LayerMarkKind, type PendingMark, SHEET_MARKS } from './sheet-marks';

/** The server's words for a refused mark, or why the phone could not keep it. */
function markProblem(error: unknown): string {
  if (error instanceof HttpErrorResponse) return problemMessage(error);
  if (typeof error === 'object' && error !== null && 'problem' in error && typeof error.problem === 'string') return error.problem;
  return error instanceof Error && error.message ? error.message : problemMessage(error);
}

/**
 * Rooms → surfaces with their measured sizes in the firm's units, and each layer on the surface
 * with "Mark done" (or "Reopen") dated today where the firm works. A mark the phone keeps for
 * later says so beside its layer.
 */
@Component({
  selector: 'lb-sheet-work',
  imports: [FormAlert, MatButtonModule, MatIconModule, TranslatePipe],
  template: `
    @let s = sheet();
    <lb-form-alert [message]="message()" />
    @for (room of s.rooms; track room.id) {
      <section class="room" [attr.aria-labelledby]="'room-' + room.id">
        <h3 [id]="'room-' + room.id">{{ room.name }}</h3>
        @for (surface of room.surfaces; track surface.id + '/' + surface.changeOrder) {
          @let size = sizes(surface);
          @let unit = 'sheet.units.' + size.unit | translate;
          <div class="surface" role="group" [attr.aria-label]="room.name + ' · ' + surface.name">
            <p class="surface-name">
              <strong>{{ surface.name }}</strong>
              <span class="muted">{{
                'sheet.work.layersDone' | translate: { done: doneCount(surface), total: surface.layers.length }
              }}</span>
            </p>
            <dl class="sizes">
              <div>
                <dt>{{ 'sheet.work.gross' | translate }}</dt>
                <dd>{{ 'sheet.work.' + size.measure | translate: { value: number(size.gross), unit: unit } }}</dd>
              </div>
              <div>
                <dt>{{ 'sheet.work.deductions' | translate }}</dt>
                <dd>{{ 'sheet.work.' + size.measure | translate: { value: number(size.deductions), unit: unit } }}</dd>
              </div>
              <div>
                <dt>{{ 'sheet.work.net' | translate }}</dt>
                <dd>
                  <strong>{{ 'sheet.work.' + size.measure | translate: { value: number(size.net), unit: unit } }}</strong>
                </dd>
              </div>
            </dl>
            @if (surface.isCeiling || surface.isCurved || surface.changeOrder !== null) {
              <p class="tags">
                @if (surface.changeOrder !== null) {
                  <span class="tag added">{{ 'sheet.work.addedBy' | translate: { number: surface.changeOrder } }}</span>
                }
                @if (surface.isCeiling) {
                  <span class="tag">{{ 'sheet.work.ceiling' | translate }}</span>
                }
                @if (surface.isCurved) {
                  <span class="tag">{{ 'sheet.work.curved' | translate }}</span>
                }
              </p>
            }
            <ol class="layers">
              @for (layer of surface.layers; track layer.layerId) {
                @let label = layer.name + ', ' + room.name + ' · ' + surface.name;
                @let waiting = waitingFor(layer.workItemId);
                @let refused = refusedFor(layer.workItemId);
                @let done = doneOn(layer);
                <li>
                  <span class="layer">
                    <mat-icon aria-hidden="true">{{ done ? 'task_alt' : 'radio_button_unchecked' }}</mat-icon>
                    <span>
                      {{ layer.name }}
                      <span class="small">
                        @if (done) {
                          {{ 'sheet.work.doneOn' | translate: { date: day(done) } }}
                        } @else {
                          {{ 'sheet.work.notDone' | translate }}
                        }
                      </span>
                      @if (waiting) {
                        <span class="small pending" role="status">
                          <mat-icon aria-hidden="true">cloud_off</mat-icon>{{ 'sheet.work.pending' | translate }}
                        </span>
                      }
                      @for (r of refused; track r.clientKey) {
                        <span class="small refused" role="alert">
                          {{ 'sheet.work.refused' | translate: { reason: r.problem ?? '' } }}
                          <button mat-button type="button" class="dismiss" (click)="marks.dismiss(r.clientKey)">
                            {{ 'sheet.work.dismiss' | translate }}
                          </button>
                        </span>
                      }
                    </span>
                  </span>
                  @if (layer.workItemId) {
                    @if (done) {
                      <button
                        mat-button
                        type="button"
                        [disabled]="sending() !== null"
                        [attr.aria-label]="'sheet.work.reopenLabel' | translate: { what: label }"
                        (click)="markLayer(room, surface, layer, 'layerReopened')"
                      >
                        {{ 'sheet.work.reopen' | translate }}
                      </button>
                    } @else {
                      <button
                        mat-flat-button
                        type="button"
                        [disabled]="sending() !== null"
                        [attr.aria-label]="'sheet.work.markDoneLabel' | translate: { what: label }"
                        (click)="markLayer(room, surface, layer, 'layerDone')"
                      >
                        {{ 'sheet.work.markDone' | translate }}
                      </button>
                    }
                  }
                </li>
              }
            </ol>
          </div>
        }
      </section>
    } @empty {
      <p class="muted">{{ 'sheet.work.none' | translate }}</p>
    }
  `,
  styleUrl: './sheet-work.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetWork {
  private readonly language = inject(Language);
  private readonly translate = inject(TranslateService);
  protected readonly marks = inject(SHEET_MARKS);

  readonly sheet = input.required<JobSheet>();

  /** the work item whose mark is on its way, so the buttons wait */
  protected readonly sending = signal<string | null>(null);
  protected readonly message = signal<string | null>(null);
  private readonly pending = computed(() => this.marks.pending(this.sheet().id)());
  private readonly waiting = computed(() => this.pending().filter((p) => p.state === 'waiting'));

  protected sizes(surface: SheetSurface) {
    return surfaceSizes(surface, this.sheet().lengthUnit, this.sheet().units);
  }

  protected doneCount(surface: SheetSurface): number {
    return surface.layers.filter((l) => this.doneOn(l) !== null).length;
  }

  protected waitingFor(workItemId: string | null): boolean {
    return this.waiting().some((p) => p.workItemId === workItemId);
  }

  protected refusedFor(workItemId: string | null): readonly PendingMark[] {
    return this.pending().filter((p) => p.state === 'refused' && p.workItemId === workItemId);
  }

  /** the layer's done date as the crew last marked it: a mark still waiting on the phone counts already */
  protected doneOn(layer: SheetSurfaceLayer): string | null {
    const last = this.waiting()
      .filter((p) => p.workItemId === layer.workItemId)
      .at(-1);
    if (!last) return layer.doneOn;
    return last.kind === 'layerDone' ? last.on : null;
  }

  protected number(value: number): string {
    return formatNumber(value, this.language.locale());
  }

  protected day(isoDate: string): string {
    return formatDay(isoDate, this.language.locale());
  }

  protected async markLayer(room: SheetRoom, surface: SheetSurface, layer: SheetSurfaceLayer, kind: LayerMarkKind): Promise<void> {
    if (!layer.workItemId) return;
    this.sending.set(layer.workItemId);
    this.message.set(null);
    try {
      await this.marks.mark(this.sheet().id, layer.workItemId, kind, todayIn(this.sheet().timeZone, new Date()));
    } catch (error) {
      const what = `${layer.name}, ${room.name} · ${surface.name}`;
      this.message.set(this.translate.instant('sheet.work.failed', { what, reason: markProblem(error) }) as string);
    } finally {
      this.sending.set(null);
    }
  }
}
