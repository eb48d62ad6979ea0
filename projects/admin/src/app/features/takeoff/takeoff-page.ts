import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { RoomView, TakeoffView } from '@layerbook/contracts/types';
import { totalsText } from '@layerbook/domain';
import { loadMessage } from '../../shared/forms/load-message';
import { LeadSafetyNote } from '../../shared/ui/lead-safety-note';
import { RoomForm } from './room-form';
import { RoomPanel } from './room-panel';
import { takeoffUrl } from './takeoff-api';

/** Site takeoff: the rooms of one site, each with its measured surfaces; built to be used on a phone on site. */
@Component({
  selector: 'lb-takeoff-page',
  imports: [
    LeadSafetyNote,
    MatButtonModule,
    MatExpansionModule,
    MatIconModule,
    MatProgressBarModule,
    RoomForm,
    RoomPanel,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './takeoff-page.html',
  styleUrl: './takeoff-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TakeoffPage {
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  /** From the route (withComponentInputBinding; inherited from `sites/:siteId/takeoff`). */
  readonly siteId = input.required<string>();

  private readonly takeoff = httpResource<TakeoffView>(() => takeoffUrl(this.siteId()));
  /** Kept on screen while it is read again after a change. */
  protected readonly view = computed(() => (this.takeoff.hasValue() ? this.takeoff.value() : null));
  protected readonly loadMessage = loadMessage(this.takeoff);
  protected readonly isAddingRoom = signal(false);
  /** The room just added opens by itself, ready for its first surface. */
  protected readonly newRoomId = signal<string | null>(null);
  protected readonly totalsText = totalsText;

  protected roomAdded(room: RoomView): void {
    this.isAddingRoom.set(false);
    this.newRoomId.set(room.id);
    this.changed(String(this.translate.instant('takeoff.takeoffPage.roomAdded', { name: room.name })));
  }

  protected changed(message: string): void {
    this.snackBar.open(message, String(this.translate.instant('takeoff.close')), { duration: 4000 });
    this.takeoff.reload();
  }

  protected failed(message: string): void {
    this.snackBar.open(message, String(this.translate.instant('takeoff.close')), { duration: 8000 });
    this.takeoff.reload();
  }
}
