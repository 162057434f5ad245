// Re-plans through POST /api/v1/plans/preview as the installer edits (debounced), keeping the last
// good plan on screen while a newer one is on its way or when an edit is not valid yet.
import { useEffect, useRef, useState } from "react";
import { useFetcher } from "react-router";
import type { KitPlan, KitPlanInput } from "~/domain/sizing/plan-types";
import type { PlanSources } from "~/lib/plan-choices";

export interface PlanShown {
  plan: KitPlan;
  sources: PlanSources;
  parts: KitPlanInput["parts"];
}
type Answer = PlanShown | { error: { message: string; fields?: Record<string, string> } };

export function usePlanPreview(choices: unknown, { skipFirst }: { skipFirst: boolean }) {
  const fetcher = useFetcher<Answer>();
  // With a saved plan on screen, the choices it was made from need no preview: only edits do.
  const shownBody = useRef(skipFirst ? JSON.stringify(choices) : null);
  const [last, setLast] = useState<PlanShown | null>(null);
  const body = JSON.stringify(choices);

  useEffect(() => {
    if (body === shownBody.current) return;
    shownBody.current = null;
    const timer = setTimeout(() => fetcher.submit(body, { method: "post", action: "/api/v1/plans/preview", encType: "application/json" }), 300);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [body]);

  const answer = fetcher.data;
  useEffect(() => {
    if (answer && "plan" in answer) setLast(answer);
  }, [answer]);

  return {
    preview: last,
    error: answer && "error" in answer ? answer.error : null,
    pending: fetcher.state !== "idle",
  };
}
