/** A refusal a forum function returns rather than throws: the status and the field to name. */
export class ForumError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly field?: string,
  ) {
    super(message);
  }
}
