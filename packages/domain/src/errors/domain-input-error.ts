/**
 * The one error the domain package throws. `field` is a path into the caller's input
 * (for example `surfaces[2].rise`) so a form can show the message beside the right field.
 */
export class DomainInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'DomainInputError';
    // Keeps `instanceof` working when compiled down to ES5-style classes by some toolchains.
    Object.setPrototypeOf(this, new.target.prototype);
  }
}
