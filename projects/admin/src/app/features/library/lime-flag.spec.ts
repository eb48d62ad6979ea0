import { FormControl } from '@angular/forms';
import type { ProductKind } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { syncLimeFlag } from './lime-flag';

const controls = (kind: ProductKind, isLime: boolean) => ({
  kind: new FormControl<ProductKind>(kind, { nonNullable: true }),
  isLime: new FormControl(isLime, { nonNullable: true }),
});

describe('the lime box follows the lime kind', () => {
  it('ticks and holds the box when the kind is lime', () => {
    const c = controls('lime', false);
    syncLimeFlag(c.kind, c.isLime);
    expect([c.isLime.value, c.isLime.disabled]).toEqual([true, true]);
  });

  it('frees the box, still ticked, when another kind is picked', () => {
    const c = controls('lime', false);
    syncLimeFlag(c.kind, c.isLime);
    c.kind.setValue('plaster');
    syncLimeFlag(c.kind, c.isLime);
    expect([c.isLime.value, c.isLime.disabled]).toEqual([true, false]);
  });

  it('leaves the box alone for other kinds', () => {
    const c = controls('paint', false);
    syncLimeFlag(c.kind, c.isLime);
    expect([c.isLime.value, c.isLime.disabled]).toEqual([false, false]);
  });
});
