import { describe, expect, it } from 'vitest';
import { finishChoiceText } from './finish-words';

describe('finishChoiceText', () => {
  it.each([
    ['Limewash', 1, 'Limewash (1 layer)'],
    ['Polished lime', 3, 'Polished lime (3 layers)'],
    ['Empty', 0, 'Empty (0 layers)'],
  ])('%s with %d layers reads "%s"', (name, count, text) => expect(finishChoiceText(name, count)).toBe(text));
});
