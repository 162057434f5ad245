// Errors shaped like Stripe's, so the SDK maps them to its own classes by status code
// (400/404 → StripeInvalidRequestError, 401 → StripeAuthenticationError, 402 → StripeCardError).
import type { ServerResponse } from "node:http";
import { sendJson } from "./http-helpers.ts";

export type StripeErrorType = "invalid_request_error" | "card_error" | "api_error";

export class StripeFakeError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly details: { type?: StripeErrorType; code?: string; param?: string } = {},
  ) {
    super(message);
  }
}

export function missingParam(param: string): StripeFakeError {
  return new StripeFakeError(400, `Missing required param: ${param}.`, {
    code: "parameter_missing",
    param,
  });
}

export function invalidParam(param: string, message: string): StripeFakeError {
  return new StripeFakeError(400, message, { code: "parameter_invalid", param });
}

export function noSuch(kind: string, id: string, param = "id"): StripeFakeError {
  return new StripeFakeError(404, `No such ${kind}: '${id}'`, { code: "resource_missing", param });
}

export function sendStripeError(res: ServerResponse, error: StripeFakeError): void {
  const { type = error.status >= 500 ? "api_error" : "invalid_request_error", code, param } = error.details;
  sendJson(res, error.status, {
    error: { type, message: error.message, ...(code ? { code } : {}), ...(param ? { param } : {}) },
  });
}
