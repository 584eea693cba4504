export type FieldErrors = Record<string, string[]>;

interface ErrorBody {
  statusCode?: number;
  error?: string;
  message?: string | string[];
  fields?: FieldErrors;
  requestId?: string;
}

/** Every failed API call becomes one of these, carrying the server's message and field-level errors. */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly error: string;
  readonly fields: FieldErrors;
  readonly requestId: string | undefined;

  constructor(status: number, body: ErrorBody = {}) {
    const message = Array.isArray(body.message) ? body.message.join(' ') : body.message;
    super(message?.trim() ? message : fallbackMessage(status));
    this.status = status;
    this.error = body.error ?? '';
    this.fields = body.fields ?? {};
    this.requestId = body.requestId;
  }

  get hasFieldErrors(): boolean {
    return Object.keys(this.fields).length > 0;
  }

  static unreachable(): ApiError {
    return new ApiError(0, { error: 'Network Error' });
  }

  static async fromResponse(response: Response): Promise<ApiError> {
    try {
      const body = (await response.json()) as ErrorBody;
      return new ApiError(response.status, body && typeof body === 'object' ? body : {});
    } catch {
      return new ApiError(response.status);
    }
  }
}

function fallbackMessage(status: number): string {
  if (status === 0) return 'Keenroute could not reach its server. Check the connection and try again.';
  if (status === 401) return 'Your session has ended. Please sign in again.';
  if (status === 403) return 'Your role does not allow this.';
  if (status === 404) return 'That was not found.';
  if (status === 429) return 'Too many attempts. Wait a minute and try again.';
  if (status >= 500) return 'Something went wrong on our side. Try again in a moment.';
  return `The request failed (${status}).`;
}
