/** One listener on one target (a missing target, e.g. no service worker support, is skipped). */
export type Listening = readonly [target: EventTarget | null | undefined, type: string, listener: () => void];

/** Adds the listeners; the answer removes them all. */
export function listenAll(listening: readonly Listening[]): () => void {
  for (const [target, type, listener] of listening) target?.addEventListener(type, listener);
  return () => {
    for (const [target, type, listener] of listening) target?.removeEventListener(type, listener);
  };
}
