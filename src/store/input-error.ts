/** A refusal the coordinator can act on, shown to them as it is. Nothing was stored. */
export class InputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'InputError';
  }
}
