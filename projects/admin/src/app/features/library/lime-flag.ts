import type { FormControl } from '@angular/forms';
import type { ProductKind } from '@layerbook/contracts/types';

/**
 * A lime product is caustic, and the alkali caution follows the "Contains lime" box alone: picking
 * the kind ticks the box and holds it while the kind stays lime (the server sets the flag for that
 * kind too). Another kind frees the box, still ticked: a plaster may hold lime as well.
 */
export function syncLimeFlag(kind: FormControl<ProductKind>, isLime: FormControl<boolean>): void {
  if (kind.value === 'lime') {
    isLime.setValue(true);
    isLime.disable();
  } else if (isLime.disabled) {
    isLime.enable();
  }
}
