// /plans/:planId/alternatives — the cheapest kits from the team's valid offers that meet every check
// of the plan and its unmet-days target, beside the current kit's own landed total (so a listed kit may
// save or cost more); "Use this kit" re-plans the plan with it as a new revision.
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Link, useNavigation } from "react-router";
import type { Route } from "./+types/plan-alternatives";
import { AlternativesTable } from "~/components/alternatives/alternatives-table";
import { FormErrors } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { alternativePickSchema } from "~/lib/alternative-forms";
import { alternativesJson } from "~/lib/alternatives-view";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { applyAlternative, findAlternatives } from "~/server/sourcing/alternatives.server";

export function meta() {
  return [{ title: "Kit alternatives · Kitwright" }];
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const found = await findAlternatives(team.teamId, params.planId);
  if (!found) throw new Response("No such plan in your team.", { status: 404 });
  return {
    planId: found.planId,
    planName: found.planName,
    revision: found.revision,
    problem: found.problem,
    view: alternativesJson(found),
    loadMs: Math.round(found.loadMs),
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  const submission = parseWithZod(await request.formData(), { schema: alternativePickSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  const outcome = await applyAlternative(team.teamId, user.id, params.planId, submission.value);
  if (!outcome) throw new Response("No such plan in your team.", { status: 404 });
  if (!outcome.ok) {
    const detail = Object.values(outcome.fields).join(" ");
    return data({ result: submission.reply({ formErrors: [detail ? `${outcome.message} ${detail}` : outcome.message] }) }, { status: outcome.status });
  }
  return redirectWithFlash(`/plans/${params.planId}`, { kind: "success", message: `Kit applied: saved as revision ${outcome.revision}.` });
}

function unmetDays(n: number) {
  return `${n} unmet-load ${n === 1 ? "day" : "days"} a year`;
}

function CurrentKit({ view }: { view: NonNullable<ReturnType<typeof alternativesJson>> }) {
  const k = view.currentKit;
  return (
    <p className="mb-3 text-sm" data-testid="current-kit">
      {k.landedCost === null ? "⚠ " : ""}
      {k.sentence}
    </p>
  );
}

export default function PlanAlternatives({ loaderData: l, actionData }: Route.ComponentProps) {
  const pending = useNavigation().state !== "idle";
  const v = l.view;
  return (
    <>
      <PageHeader
        title={`Kits that meet ${l.planName}, cheapest first`}
        lead={
          <>
            From your team's valid offers, the kits that meet every check of this plan (revision {l.revision})
            {v ? ` and stay within the ${unmetDays(v.acceptedUnmetDays)} it accepts` : ""}, cheapest landed cost first.{" "}
            <Link to={`/plans/${l.planId}`} className="underline">
              Back to the plan
            </Link>
          </>
        }
      />
      <FormErrors errors={actionData?.result.error?.[""] ?? undefined} />
      {l.problem ? <p className="rounded-lg border border-warn bg-warn-wash p-3 text-sm">⚠ This plan cannot be searched: {l.problem}</p> : null}
      {v ? (
        <div className="space-y-6">
          <Panel title="The search">
            <ul className="space-y-1 text-sm" data-testid="search-figures">
              <li>
                <span className="figures">{v.considered.toLocaleString("en-GB")}</span> candidate kits considered (parts × string layout × battery bank) from{" "}
                <span className="figures">{v.offersUsed}</span> valid offers, in <span className="figures">{v.searchMs}</span> ms
                <span className="text-ink-faint"> (+{l.loadMs} ms reading offers and parts)</span>.
              </li>
              <li>
                <span className="figures">{v.dominatedOfferCombinations.toLocaleString("en-GB")}</span> offer combinations skipped: another offer of the same
                part was cheaper at the same quantity.
              </li>
              {v.pruned.map((p) => (
                <li key={p.reason}>
                  <span className="figures">{p.count.toLocaleString("en-GB")}</span> pruned — {p.reason}.
                </li>
              ))}
              <li>
                <span className="figures">{v.fullChecks}</span> cheapest candidates re-planned in full; <span className="figures">{v.fullCheckFailures}</span>{" "}
                failed a check or went over the accepted unmet-load days there and are not listed (<span className="figures">{v.overUnmetDays}</span> of them
                over the days).
              </li>
              {v.ratesUsed.length ? (
                <li>
                  Converted to {v.currency} at your rates: {v.ratesUsed.map((r) => `1 ${r.from} = ${r.rate} ${r.to} (${r.asOf})`).join("; ")}.
                </li>
              ) : (
                <li>All offers are in {v.currency}: no conversion.</li>
              )}
              {v.exhausted ? <li className="text-warn">⚠ The kept candidates ran out before ten kits passed: the list may miss dearer kits.</li> : null}
              {v.targetNote ? (
                <li className="text-warn" data-testid="target-note">
                  ⚠ {v.targetNote}
                </li>
              ) : null}
            </ul>
            <p className="mt-3 text-xs text-ink-faint">
              The ranking is exact over the candidates considered: for each string length the fewest modules the worst month needs and up to two more strings in
              parallel, and the autonomy-sized battery bank with up to two more strings. {v.lifetimeNote}
            </p>
          </Panel>
          {v.alternatives.length ? (
            <Panel title={`The ${v.alternatives.length} cheapest kits`}>
              <CurrentKit view={v} />
              <AlternativesTable view={v} pending={pending} />
              <p className="mt-3 text-xs text-ink-faint">
                ⚠ Before buying: a licensed installer confirms the design against local electrical codes — DC arcs, battery fire and cold-morning overvoltage
                can hurt people.
              </p>
            </Panel>
          ) : (
            <Panel>
              <CurrentKit view={v} />
              <p className="text-sm">
                {v.targetNote ?? "No kit from your valid offers meets every check of this plan."} Add offers for more parts on the{" "}
                <Link to="/sourcing" className="underline">
                  sourcing page
                </Link>
                .
              </p>
            </Panel>
          )}
        </div>
      ) : null}
    </>
  );
}
