import { APIError } from "better-auth/api";

/** The message better-auth gave for a refused request, or null for an unexpected error. */
export function authErrorMessage(error: unknown): string | null {
  if (error instanceof APIError) return error.body?.message ?? error.message ?? "The request was refused.";
  return null;
}
