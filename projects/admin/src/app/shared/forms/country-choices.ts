import { COUNTRIES } from '@layerbook/contracts/types';

/** ISO 3166-1 alpha-2 countries, offered by name in the reader's alphabetical order (firm and site forms). */
export const COUNTRY_CHOICES: ReadonlyArray<{ readonly code: string; readonly name: string }> = [...COUNTRIES].sort((a, b) =>
  a.name.localeCompare(b.name),
);
