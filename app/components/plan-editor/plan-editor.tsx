// The plan editor: choices on the left, the live plan on the right, and a form that saves them.
import { useState, type ReactNode } from "react";
import { Form, useNavigation } from "react-router";
import { SubmitButton } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { choicesFromState, type PlanEditorState } from "~/lib/plan-editor-state";
import { PlanChoicesPanel, type PartOptions } from "./plan-choices-panel";
import { usePlanPreview, type PlanShown } from "./use-plan-preview";

export function PlanEditor({
  initial,
  initialPlan,
  options,
  serverErrors,
  saveLabel,
  intent,
  withNote,
  renderPlan,
}: {
  initial: PlanEditorState;
  initialPlan: PlanShown | null;
  options: PartOptions;
  serverErrors: Record<string, string>;
  saveLabel: string;
  intent?: string;
  withNote?: boolean;
  renderPlan: (shown: PlanShown) => ReactNode;
}) {
  const navigation = useNavigation();
  const [state, setState] = useState(initial);
  const choices = choicesFromState(state);
  const { preview, error, pending } = usePlanPreview(choices, { skipFirst: initialPlan !== null });
  const shown = preview ?? initialPlan;
  const errors = { ...serverErrors, ...(error?.fields ?? {}) };
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,22rem)_1fr]">
      <div className="space-y-4">
        <Panel title="Choices">
          <PlanChoicesPanel state={state} options={options} errors={errors} update={(patch) => setState((s) => ({ ...s, ...patch }))} />
        </Panel>
        <Form method="post" className="space-y-2">
          {intent ? <input type="hidden" name="intent" value={intent} /> : null}
          <input type="hidden" name="choices" value={JSON.stringify(choices)} />
          {withNote ? (
            <div>
              <label htmlFor="revision-note" className="mb-0.5 block text-sm font-medium">
                What changed (kept with the revision)
              </label>
              <input id="revision-note" name="note" maxLength={300} className="block w-full rounded-md border border-rule bg-sheet px-2 py-1.5 text-sm" />
            </div>
          ) : null}
          <SubmitButton pending={navigation.state === "submitting"}>{saveLabel}</SubmitButton>
        </Form>
      </div>
      <div className="min-w-0 space-y-4">
        <div aria-live="polite" className="min-h-6 text-sm">
          {pending ? <span className="text-ink-soft">⟳ Re-planning…</span> : null}
          {error && !pending ? (
            <span role="alert" className="text-fail">
              ✕ {error.message} {shown ? "The plan shown is from the last valid choices." : ""}
            </span>
          ) : null}
        </div>
        <div className={pending ? "opacity-60 transition-opacity" : "transition-opacity"}>
          {shown ? renderPlan(shown) : <p className="text-ink-soft">Choose the parts to see the plan.</p>}
        </div>
      </div>
    </div>
  );
}
