/** Bad input to the sky computations, with a message a person understands and the field at fault. */
export class SkyInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'SkyInputError';
  }
}
