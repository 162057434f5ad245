// The app's live previews post to JSON API routes that compute and store nothing. React Router would
// reload every loader on the page after each one (and a navigation started meanwhile could lose out to
// that reload); routes showing a preview skip it.
import type { ShouldRevalidateFunctionArgs } from "react-router";

const PREVIEW_ACTIONS = ["/api/v1/plans/preview", "/api/v1/readings/preview", "/api/v1/yield"];

export function skipAfterPreview({ formAction, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) {
  if (formAction && PREVIEW_ACTIONS.some((path) => formAction === path || formAction.startsWith(`${path}?`))) return false;
  return defaultShouldRevalidate;
}
