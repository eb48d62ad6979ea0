import { ChangeDetectionStrategy, Component, OnInit, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { firstValueFrom } from 'rxjs';
import { shapeChoice, type RoomView, type SurfaceView, type TakeoffLengthUnit } from '@layerbook/contracts/types';
import { fixedNumber, measureText, plainNumber, totalsText, workingText } from '@layerbook/domain';
import { toProblem } from '../../core/errors/problem';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { ShapeSketch } from './shape-sketch';
import { RoomForm } from './room-form';
import { RoomPhotos } from './room-photos';
import { SurfaceForm } from './surface-form';
import { TakeoffApi } from './takeoff-api';

/** Which form is open in the room: `'room'` (renaming it), `'new'` (a surface), a surface's id, or none. */
type Editing = string | null;

/** One room as an expandable panel: its surfaces with their numbers and sketches, and the edits. */
@Component({
  selector: 'lb-room-panel',
  imports: [MatButtonModule, MatExpansionModule, MatIconModule, RoomForm, RoomPhotos, ShapeSketch, SurfaceForm, TranslatePipe],
  templateUrl: './room-panel.html',
  styleUrl: './room-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoomPanel implements OnInit {
  private readonly api = inject(TakeoffApi);
  private readonly dialog = inject(MatDialog);
  private readonly translate = inject(TranslateService);

  readonly room = input.required<RoomView>();
  readonly siteId = input.required<string>();
  readonly unit = input.required<TakeoffLengthUnit>();
  /** the firm's smallest deducted opening, in `unit`² (smaller openings stay in the area) */
  readonly minDeductedOpeningArea = input(0);
  readonly index = input.required<number>();
  readonly roomCount = input.required<number>();
  readonly startOpen = input(false);
  /** Something changed on the server: the page reloads and says `message`. */
  readonly changed = output<string>();
  /** A failed action, for the page to announce. */
  readonly failed = output<string>();

  protected readonly isOpen = signal(false);
  protected readonly editing = signal<Editing>(null);
  protected readonly isBusy = signal(false);
  protected readonly quantityText = measureText;
  protected readonly workingText = workingText;
  protected readonly totalsText = totalsText;
  protected readonly amount = fixedNumber;
  protected readonly shortNumber = plainNumber;

  ngOnInit(): void {
    this.isOpen.set(this.startOpen());
  }

  protected shapeLabel(surface: SurfaceView): string {
    return shapeChoice(surface.shape.kind).label;
  }

  /** A form saved: `key` is the message's words, `name` what it names. */
  protected done(key: string, name?: string): void {
    this.editing.set(null);
    this.changed.emit(this.words(key, { name }));
  }

  protected moveRoom(by: -1 | 1): Promise<void> {
    return this.run(() => this.api.moveRoom(this.room().id, this.index() + by), this.words('takeoff.roomPanel.roomMoved'));
  }

  protected async deleteRoom(): Promise<void> {
    const room = this.room();
    const n = room.surfaces.length;
    const ok = await this.confirm({
      title: 'takeoff.roomPanel.deleteTitle',
      message:
        n === 0 ? 'takeoff.roomPanel.deleteRoomEmpty' : n === 1 ? 'takeoff.roomPanel.deleteRoomOne' : 'takeoff.roomPanel.deleteRoomMany',
      confirmLabel: 'takeoff.roomPanel.deleteRoom',
      params: { name: room.name, count: n },
    });
    if (ok) await this.run(() => this.api.deleteRoom(room.id), this.words('takeoff.roomPanel.deleted', { name: room.name }));
  }

  protected duplicateSurface(surface: SurfaceView): Promise<void> {
    return this.run(() => this.api.duplicateSurface(surface.id), this.words('takeoff.roomPanel.copied', { name: surface.name }));
  }

  protected moveSurface(surface: SurfaceView, index: number, by: -1 | 1): Promise<void> {
    return this.run(() => this.api.moveSurface(surface.id, index + by), this.words('takeoff.roomPanel.surfaceMoved'));
  }

  protected async deleteSurface(surface: SurfaceView): Promise<void> {
    const ok = await this.confirm({
      title: 'takeoff.roomPanel.deleteTitle',
      message: 'takeoff.roomPanel.deleteSurfaceMessage',
      confirmLabel: 'takeoff.roomPanel.deleteSurfaceConfirm',
      params: { name: surface.name },
    });
    if (ok) await this.run(() => this.api.deleteSurface(surface.id), this.words('takeoff.roomPanel.deleted', { name: surface.name }));
  }

  private async run(action: () => Promise<unknown>, message: string): Promise<void> {
    this.isBusy.set(true);
    try {
      await action();
      this.changed.emit(message);
    } catch (error) {
      this.failed.emit(toProblem(error).detail ?? toProblem(error).title);
    } finally {
      this.isBusy.set(false);
    }
  }

  private words(key: string, params?: Record<string, unknown>): string {
    return String(this.translate.instant(key, params));
  }

  private confirm(data: ConfirmDialogData): Promise<boolean | undefined> {
    return firstValueFrom(this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data }).afterClosed());
  }
}
