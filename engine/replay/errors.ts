/** A log that cannot drive or be compared with the drawing: the message names the tag and word. */
export class ReplayError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ReplayError';
  }
}
