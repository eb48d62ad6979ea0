import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { RoomView, TakeoffView } from '@layerbook/contracts';
import { convertArea, safetyCautions } from '@layerbook/domain';
import { toProblem } from '../../core/errors/problem';
import { LeadSafetyNote } from '../../shared/ui/lead-safety-note';
import { totalsText } from './measure-words';
import { RoomForm } from './room-form';
import { RoomPanel } from './room-panel';
import { TakeoffApi } from './takeoff-api';

/** Site takeoff: the rooms of one site, each with its measured surfaces; built to be used on a phone on site. */
@Component({
  selector: 'lb-takeoff-page',
  imports: [LeadSafetyNote, MatButtonModule, MatExpansionModule, MatIconModule, MatProgressBarModule, RoomForm, RoomPanel, RouterLink],
  templateUrl: './takeoff-page.html',
  styleUrl: './takeoff-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TakeoffPage implements OnInit {
  private readonly api = inject(TakeoffApi);
  private readonly snackBar = inject(MatSnackBar);

  /** From the route (withComponentInputBinding; inherited from `sites/:siteId/takeoff`). */
  readonly siteId = input.required<string>();

  protected readonly view = signal<TakeoffView | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly loadMessage = signal<string | null>(null);
  protected readonly isAddingRoom = signal(false);
  /** The room just added opens by itself, ready for its first surface. */
  protected readonly newRoomId = signal<string | null>(null);
  protected readonly totalsText = totalsText;

  /**
   * The lead-safe reminder once the measurements show enough disturbed paint in an old building;
   * the thresholds live in the domain's safety rules (40 CFR 745.83), not here.
   */
  protected readonly leadCaution = computed(() => {
    const v = this.view();
    if (!v || v.site.yearBuilt === null) return null;
    const disturbedPaint = v.rooms.flatMap((room: RoomView) =>
      room.surfaces
        .filter((s) => s.disturbedPaintedArea !== null && s.disturbedPaintedArea > 0)
        .map((s) => ({ roomId: room.id, isExterior: room.isExterior, area: convertArea(s.disturbedPaintedArea ?? 0, s.lengthUnit, v.lengthUnit) })),
    );
    const cautions = safetyCautions({ lengthUnit: v.lengthUnit, yearBuilt: v.site.yearBuilt, disturbedPaint, workingLevel: 0, products: [], sandsPlaster: false });
    return cautions.find((c) => c.id === 'lead-safe-work') ?? null;
  });

  ngOnInit(): void {
    void this.reload();
  }

  protected async roomAdded(room: RoomView): Promise<void> {
    this.isAddingRoom.set(false);
    this.newRoomId.set(room.id);
    await this.changed(`${room.name} added.`);
  }

  protected async changed(message: string): Promise<void> {
    this.snackBar.open(message, 'Close', { duration: 4000 });
    await this.reload();
  }

  protected failed(message: string): void {
    this.snackBar.open(message, 'Close', { duration: 8000 });
    void this.reload();
  }

  private async reload(): Promise<void> {
    try {
      this.view.set(await this.api.load(this.siteId()));
      this.loadMessage.set(null);
    } catch (error) {
      this.loadMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
