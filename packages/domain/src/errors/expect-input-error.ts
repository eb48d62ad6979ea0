import { DomainInputError } from './domain-input-error';

/** Test helper (used only by specs): the call throws a DomainInputError naming `field`. */
export function expectInputError(call: () => unknown, field: string, message?: string | RegExp): void {
  let thrown: unknown;
  try {
    call();
  } catch (e) {
    thrown = e;
  }
  expect(thrown).toBeInstanceOf(DomainInputError);
  expect((thrown as DomainInputError).field).toBe(field);
  if (message !== undefined) expect((thrown as DomainInputError).message).toMatch(message);
}
