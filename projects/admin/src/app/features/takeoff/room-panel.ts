import { ChangeDetectionStrategy, Component, OnInit, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
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
  imports: [MatButtonModule, MatExpansionModule, MatIconModule, RoomForm, RoomPhotos, ShapeSketch, SurfaceForm],
  templateUrl: './room-panel.html',
  styleUrl: './room-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoomPanel implements OnInit {
  private readonly api = inject(TakeoffApi);
  private readonly dialog = inject(MatDialog);

  readonly room = input.required<RoomView>();
  readonly siteId = input.required<string>();
  readonly unit = input.required<TakeoffLengthUnit>();
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

  protected done(message: string): void {
    this.editing.set(null);
    this.changed.emit(message);
  }

  protected moveRoom(by: -1 | 1): Promise<void> {
    return this.run(() => this.api.moveRoom(this.room().id, this.index() + by), 'Room moved.');
  }

  protected async deleteRoom(): Promise<void> {
    const room = this.room();
    const n = room.surfaces.length;
    const ok = await this.confirm({
      title: `Delete ${room.name}?`,
      message: `${n === 0 ? 'The room has no surfaces yet.' : `Its ${n} measured surface${n === 1 ? '' : 's'} will be deleted with it.`} Its photos go too.`,
      confirmLabel: 'Delete room',
    });
    if (ok) await this.run(() => this.api.deleteRoom(room.id), `${room.name} deleted.`);
  }

  protected duplicateSurface(surface: SurfaceView): Promise<void> {
    return this.run(() => this.api.duplicateSurface(surface.id), `${surface.name} copied.`);
  }

  protected moveSurface(surface: SurfaceView, index: number, by: -1 | 1): Promise<void> {
    return this.run(() => this.api.moveSurface(surface.id, index + by), 'Surface moved.');
  }

  protected async deleteSurface(surface: SurfaceView): Promise<void> {
    const ok = await this.confirm({
      title: `Delete ${surface.name}?`,
      message: 'Its sizes and notes will be gone.',
      confirmLabel: 'Delete surface',
    });
    if (ok) await this.run(() => this.api.deleteSurface(surface.id), `${surface.name} deleted.`);
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

  private confirm(data: ConfirmDialogData): Promise<boolean | undefined> {
    return firstValueFrom(this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data }).afterClosed());
  }
}
