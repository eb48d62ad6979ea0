import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { SurfaceShape } from '@layerbook/domain';
import { SKETCH_HEIGHT, SKETCH_WIDTH, sketchShape } from './sketch';

/** A small line drawing of one shape with its sizes written on it (see sketch.ts). */
@Component({
  selector: 'lb-shape-sketch',
  imports: [TranslatePipe],
  template: `
    @if (sketch(); as s) {
      <figure>
        <svg [attr.viewBox]="viewBox" role="img" [attr.aria-label]="s.description" preserveAspectRatio="xMidYMid meet">
          @for (d of s.guides; track $index) {
            <path class="guide" [attr.d]="d" />
          }
          @for (d of s.lines; track $index) {
            <path class="outline" [attr.d]="d" />
          }
          @for (l of s.labels; track $index) {
            <text [attr.x]="l.x" [attr.y]="l.y" [attr.text-anchor]="l.anchor">{{ l.text }}</text>
          }
        </svg>
        <figcaption>{{ (s.isToScale ? 'takeoff.shapeSketch.toScale' : 'takeoff.shapeSketch.notToScale') | translate }}</figcaption>
      </figure>
    }
  `,
  styles: `
    :host {
      display: block;
    }
    figure {
      margin: 0;
    }
    svg {
      display: block;
      width: 100%;
      max-width: 20rem;
      height: auto;
      background: var(--mat-sys-surface-container-lowest);
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 8px;
    }
    .outline {
      fill: none;
      stroke: var(--lb-umber);
      stroke-width: 2;
      stroke-linejoin: round;
    }
    .guide {
      fill: none;
      stroke: var(--lb-verdigris);
      stroke-width: 1;
      stroke-dasharray: 4 3;
    }
    text {
      font: 600 11px var(--lb-sans);
      fill: var(--lb-umber-dark);
    }
    figcaption {
      font-size: 0.8rem;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShapeSketch {
  private readonly translate = inject(TranslateService);

  readonly shape = input.required<SurfaceShape | null>();
  readonly unit = input.required<string>();

  protected readonly viewBox = `0 0 ${SKETCH_WIDTH} ${SKETCH_HEIGHT}`;
  protected readonly sketch = computed(() => {
    const shape = this.shape();
    return shape ? sketchShape(shape, this.unit(), (key, params) => String(this.translate.instant(key, params))) : null;
  });
}
