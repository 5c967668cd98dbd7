// One error type for the whole stand-in; it renders as Stripe's v1 error body
// `{ error: { type, code?, message, param?, ... } }` with the status Stripe would use.
export type StripeErrorType =
  | 'invalid_request_error'
  | 'card_error'
  | 'idempotency_error'
  | 'api_error'
  | 'authentication_error';

export interface StripeErrorBody {
  type: StripeErrorType;
  message: string;
  code?: string;
  param?: string;
  decline_code?: string;
  charge?: string;
  payment_intent?: Record<string, unknown>;
  doc_url?: string;
}

export class StripeFakeError extends Error {
  readonly status: number;
  readonly body: StripeErrorBody;
  /** Parameter validation failures are not saved against an Idempotency-Key (as at Stripe). */
  readonly beforeExecution: boolean;

  constructor(status: number, body: StripeErrorBody, beforeExecution = false) {
    super(body.message);
    this.name = 'StripeFakeError';
    this.status = status;
    this.body = body;
    this.beforeExecution = beforeExecution;
  }

  toJSON(): { error: StripeErrorBody } {
    const body: StripeErrorBody = { ...this.body };
    if (body.code && !body.doc_url) body.doc_url = `https://stripe.com/docs/error-codes/${body.code.replace(/_/g, '-')}`;
    return { error: body };
  }

  static invalidRequest(message: string, extra: { param?: string; code?: string; status?: number } = {}): StripeFakeError {
    const { status = 400, ...rest } = extra;
    return new StripeFakeError(status, { type: 'invalid_request_error', message, ...rest });
  }

  static missingParam(param: string): StripeFakeError {
    return new StripeFakeError(
      400,
      { type: 'invalid_request_error', code: 'parameter_missing', message: `Missing required param: ${param}.`, param },
      true,
    );
  }

  static invalidParam(param: string, message: string, code = 'parameter_invalid'): StripeFakeError {
    return new StripeFakeError(400, { type: 'invalid_request_error', code, message, param }, true);
  }

  static unknownParam(param: string): StripeFakeError {
    return new StripeFakeError(
      400,
      { type: 'invalid_request_error', code: 'parameter_unknown', message: `Received unknown parameter: ${param}`, param },
      true,
    );
  }

  /** A path id that does not exist: 404. */
  static noSuch(noun: string, id: string, param = 'id'): StripeFakeError {
    return new StripeFakeError(404, {
      type: 'invalid_request_error',
      code: 'resource_missing',
      message: `No such ${noun}: '${id}'`,
      param,
    });
  }

  /** A body parameter naming an object that does not exist: Stripe answers 400 here, not 404. */
  static noSuchReferenced(noun: string, id: string, param: string): StripeFakeError {
    return new StripeFakeError(400, {
      type: 'invalid_request_error',
      code: 'resource_missing',
      message: `No such ${noun}: '${id}'`,
      param,
    });
  }

  static notEmulated(what: string, param?: string): StripeFakeError {
    return new StripeFakeError(400, {
      type: 'invalid_request_error',
      message: `${what} is not emulated by the local Stripe stand-in.`,
      ...(param ? { param } : {}),
    });
  }
}
