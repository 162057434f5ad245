// A saved kit plan: the revision's snapshot, what changed since, the editor for a new revision, the
// overrides of failing safety checks, and the revision history.
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/plan";
import { PageHeader, Panel } from "~/components/page-header";
import { PlanEditor } from "~/components/plan-editor/plan-editor";
import { PlanHistory } from "~/components/plan-editor/plan-history";
import { OverrideForm } from "~/components/plan-editor/override-form";
import { PlanResultView } from "~/components/plan-editor/plan-result-view";
import { blockingFailures } from "~/domain/sizing/checks";
import { describeInputChanges, describeResultChanges } from "~/domain/sizing/plan-changes";
import { editorStateFrom } from "~/lib/plan-editor-state";
import { overrideSchema } from "~/lib/plan-override-form";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { editorOptions } from "~/server/plans/plan-page.server";
import { choicesFromForm, planFromChoices } from "~/server/plans/plan-service.server";
import { addRevision, findPlan, saveOverrides } from "~/server/plans/plans.server";
import { skipAfterPreview } from "~/lib/preview-revalidation";

export const shouldRevalidate = skipAfterPreview;

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.name ?? "Kit plan"} · Kitwright` }];

async function loadPlan(request: Request, planId: string, revision?: number) {
  const { user, team } = await requireTeamMember(request);
  const found = await findPlan(team.teamId, planId, revision);
  if (!found) throw new Response("No such plan in your team.", { status: 404 });
  return { user, team, ...found };
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const param = new URL(request.url).searchParams.get("revision");
  const wanted = param && /^\d{1,6}$/.test(param) ? Number(param) : undefined;
  const { team, plan, revision, history } = await loadPlan(request, params.planId, wanted);
  const isLatest = revision.revision === plan.latest_revision;
  const current = isLatest ? await planFromChoices(team.teamId, revision.choices) : null;
  const inputChanges = current?.ok ? describeInputChanges(revision.inputs, current.input) : [];
  const changes = current?.ok ? [...inputChanges, ...describeResultChanges(revision.result, current.plan)] : [];
  // Results that differ from the same inputs come from a change in how Kitwright works a plan out.
  const changedBy = !changes.length ? null : inputChanges.length ? "data" : "method";
  return {
    name: plan.name,
    planId: plan.id,
    siteId: plan.site_id,
    revision: {
      number: revision.revision,
      result: revision.result,
      parts: revision.inputs.parts,
      overrides: revision.overrides,
      note: revision.note,
      createdAt: revision.created_at,
    },
    isLatest,
    sources: current?.ok ? current.sources : null,
    currentProblem: current && !current.ok ? current.message : null,
    changes,
    changedBy,
    history,
    editor: isLatest ? { initial: editorStateFrom(revision.choices), options: await editorOptions(team.teamId, plan.site_id) } : null,
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { user, team, plan, revision } = await loadPlan(request, params.planId);
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (intent === "override") {
    const submission = parseWithZod(formData, { schema: overrideSchema });
    if (submission.status !== "success")
      return data({ errors: { [`override.${formData.get("checkId")}`]: submission.error?.reason?.[0] ?? "Give a reason." } }, { status: 400 });
    const failing = blockingFailures(revision.result.checks).map((c) => c.id);
    if (!failing.includes(submission.value.checkId))
      return data({ errors: { [`override.${submission.value.checkId}`]: "Only a failing safety check needs an override." } }, { status: 400 });
    const kept = revision.overrides.filter((o) => o.checkId !== submission.value.checkId);
    const entry = { checkId: submission.value.checkId, reason: submission.value.reason, byUserId: user.id, byName: user.name, at: new Date().toISOString() };
    await saveOverrides(team.teamId, plan.id, [...kept, entry]);
    return redirectWithFlash(`/plans/${plan.id}`, { kind: "info", message: "The failing check is accepted with your reason, which stays with this revision." });
  }
  const replanCurrent = intent === "replan-current";
  const outcome = await planFromChoices(team.teamId, replanCurrent ? revision.choices : choicesFromForm(formData));
  if (!outcome.ok) return data({ errors: outcome.fields }, { status: 400 });
  const typed = String(formData.get("note") ?? "")
    .trim()
    .slice(0, 300);
  const note = replanCurrent ? "Re-planned with current catalogue and site data." : typed || "Design changed.";
  const number = await addRevision(team.teamId, plan.id, user.id, outcome.choices, outcome.input, outcome.plan, note);
  return redirectWithFlash(`/plans/${plan.id}`, { kind: "success", message: `Saved as revision ${number}.` });
}

export default function PlanPage({ loaderData, actionData }: Route.ComponentProps) {
  const l = loaderData;
  const navigation = useNavigation();
  const errors = actionData?.errors ?? {};
  const savedView = (
    <PlanResultView
      plan={l.revision.result}
      sources={l.sources}
      parts={l.revision.parts}
      overrides={l.revision.overrides}
      overrideForm={l.isLatest ? (check) => <OverrideForm checkId={check.id} error={errors[`override.${check.id}`]} /> : undefined}
    />
  );
  return (
    <>
      <PageHeader
        title={l.name}
        lead={
          <>
            Revision {l.revision.number}
            {l.isLatest ? " (latest)" : ""} · {l.revision.note} ·{" "}
            <Link to={`/sites/${l.siteId}`} className="underline">
              the site
            </Link>
          </>
        }
        actions={
          l.isLatest ? (
            <span className="flex flex-col items-end gap-1">
              {/* A whole-page post: it leaves the plan editor (and any live preview still in flight) behind for good. */}
              <Form method="post" action="/quotes" reloadDocument>
                <input type="hidden" name="planId" value={l.planId} />
                <button type="submit" className="rounded-md bg-copper px-3 py-1.5 text-sm font-medium text-sheet hover:bg-copper-dark">
                  Quote this plan
                </button>
              </Form>
              <Link to={`/plans/${l.planId}/alternatives`} className="text-sm font-medium text-copper underline">
                Kits from your offers that meet this plan →
              </Link>
              <Link to={`/sourcing/compare/modules?plan=${l.planId}`} className="text-sm text-ink-soft underline">
                Compare offers for this plan →
              </Link>
            </span>
          ) : undefined
        }
      />
      {!l.isLatest ? (
        <p className="mb-4 rounded-lg border border-rule bg-sheet p-3 text-sm">
          ℹ You are reading an earlier revision, kept as it was saved.{" "}
          <Link to={`/plans/${l.planId}`} className="underline">
            Go to the latest
          </Link>
          .
        </p>
      ) : null}
      {l.currentProblem ? (
        <p className="mb-4 rounded-lg border border-warn bg-warn-wash p-3 text-sm">
          ⚠ This plan cannot be worked out again with today's data: {l.currentProblem}
        </p>
      ) : null}
      {l.changes.length ? (
        <div className="mb-4 rounded-lg border border-warn bg-warn-wash p-4 text-sm" role="status">
          <p className="font-semibold">
            {l.changedBy === "data"
              ? "⚠ Since this revision was saved, the data behind it changed:"
              : "⚠ Kitwright's way of working out plans has changed since this revision was saved; the same inputs now give:"}
          </p>
          <ul className="mt-1 list-disc pl-5">
            {l.changes.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
          <Form method="post" className="mt-2">
            <input type="hidden" name="intent" value="replan-current" />
            <button type="submit" disabled={navigation.state !== "idle"} className="rounded-md bg-copper px-3 py-1.5 font-medium text-sheet">
              Re-plan with current data
            </button>
          </Form>
        </div>
      ) : null}
      {savedView}
      {l.editor ? (
        <details className="mt-8 rounded-xl border border-rule bg-sheet p-4">
          <summary className="cursor-pointer text-lg font-semibold">Change the design</summary>
          <div className="mt-4">
            <PlanEditor
              initial={l.editor.initial}
              initialPlan={null}
              options={l.editor.options}
              serverErrors={errors}
              saveLabel={`Save as revision ${l.revision.number + 1}`}
              intent="save-revision"
              withNote
              renderPlan={(shown) => <PlanResultView plan={shown.plan} sources={shown.sources} parts={shown.parts} overrides={[]} preview />}
            />
          </div>
        </details>
      ) : null}
      <div className="mt-8">
        <Panel title="Revisions">
          <PlanHistory planId={l.planId} history={l.history} current={l.revision.number} />
        </Panel>
      </div>
    </>
  );
}
