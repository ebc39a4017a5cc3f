// A local service could not start; `code` is stable for scripts, `message` is for people.
export class ServiceError extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
    this.name = 'ServiceError';
  }
}

export function describeError(error: unknown): string {
  if (error instanceof ServiceError) return `${error.message} [${error.code}]`;
  if (error instanceof Error) return error.stack ?? error.message;
  return String(error);
}
