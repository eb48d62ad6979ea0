/**
 * For specs: the text of a full key (`billing.status.paid`) in the given areas' words, with its
 * {{params}} filled as the translate service does; the key itself when missing.
 */
export function wordsAt(areas: Record<string, unknown>, key: string, params: Readonly<Record<string, unknown>> = {}): string {
  const found = key
    .split('.')
    .reduce<unknown>((at, part) => (at && typeof at === 'object' ? (at as Record<string, unknown>)[part] : undefined), areas);
  return typeof found === 'string'
    ? found.replace(/\{\{\s*(\w+)\s*\}\}/g, (_, name: string) => {
        const value = params[name];
        return typeof value === 'string' || typeof value === 'number' ? String(value) : '';
      })
    : key;
}
