/** A failure the person running the command can fix; its message says how, so it prints without a stack. */
export class SetupError extends Error {
  override name = 'SetupError';
}

export function describeFailure(error: unknown): string {
  if (error instanceof SetupError) return error.message;
  if (error instanceof Error) return error.stack ?? error.message;
  return String(error);
}
