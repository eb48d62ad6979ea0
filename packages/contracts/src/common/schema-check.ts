import type { z } from 'zod';

/** Each is assignable to the other (readonly aside, as the interfaces mark what the apps must not change). */
type Assignable<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
/** The same type: mutually assignable with the same keys (so an optional field cannot go missing). */
type Same<A, B> = Assignable<A, B> extends true ? Assignable<keyof A, keyof B> : false;

/**
 * Returns the schema unchanged, after checking at compile time that what it parses is exactly the
 * zod-free request interface the apps send, so the two can never drift apart:
 * `export const signInRequest = requestSchema<SignInRequest>()(z.strictObject({ … }))`.
 * A mismatch fails here, naming the interface.
 */
export function requestSchema<Request>() {
  return <S extends z.ZodType>(schema: S & (Same<z.output<S>, Request> extends true ? unknown : { parsesExactly: Request })): S => schema;
}
