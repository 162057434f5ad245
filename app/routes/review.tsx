// /review — the curator's queue: pending readings, oldest first, each with its normalised value, its
// robust outlier score against the model's approved readings, its flags, photo and sweep. Approve or
// reject one at a time, or tick several clear cases and decide them together.
import { useRef } from "react";
import { Form, Link, useActionData, useNavigation } from "react-router";
import type { Route } from "./+types/review";
import { FormErrors, inputClass } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { QueueCard } from "~/components/readings/queue-card";
import { StatusBadge } from "~/components/readings/status-badge";
import { OUTLIER_Z, robustZScore } from "~/domain/catalogue/robust-stats";
import { formatReadingTime } from "~/domain/readings/reading-time";
import { requireRole } from "~/server/guards.server";
import { handleDecisionAction } from "~/server/readings/decision-action.server";
import { approvedValuesByModule, listPendingQueue, listRecentDecisions } from "~/server/readings/reading-queries.server";

export const meta: Route.MetaFunction = () => [{ title: "Review · Kitwright" }];

const PAGE_SIZE = 10;

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, "curator");
  const page = Math.max(1, Math.min(10_000, Number.parseInt(new URL(request.url).searchParams.get("page") ?? "1", 10) || 1));
  const [{ items, total }, recent] = await Promise.all([listPendingQueue({ limit: PAGE_SIZE, offset: (page - 1) * PAGE_SIZE }), listRecentDecisions(10)]);
  const approved = await approvedValuesByModule([...new Set(items.map((r) => r.moduleId))]);
  return {
    page,
    pages: Math.max(1, Math.ceil(total / PAGE_SIZE)),
    total,
    queue: items.map((r) => {
      const reference = approved.get(r.moduleId) ?? [];
      const z = robustZScore(r.stcPmaxW, reference);
      return {
        id: r.id,
        kind: r.kind,
        maker: r.maker,
        model: r.model,
        nameplatePmaxW: r.nameplatePmaxW,
        stcPmaxW: r.stcPmaxW,
        measuredPmaxW: r.measuredPmaxW,
        uncertaintyPct: r.uncertaintyPct,
        weight: r.weight,
        irradianceSource: r.irradianceSource,
        irradianceWm2: r.irradianceWm2,
        cellTempC: r.cellTempC,
        moduleTempC: r.moduleTempC,
        flags: r.flags,
        takenAtText: formatReadingTime(new Date(r.takenAt), r.utcOffsetMin),
        submittedAt: new Date(r.createdAt).toISOString(),
        submitterName: r.submitterName,
        teamName: r.teamName,
        photoId: r.photoId,
        sweep: r.sweep,
        mpp: r.vmpV !== null && r.impA !== null ? { vmpV: r.vmpV, impA: r.impA, pmaxW: r.measuredPmaxW } : null,
        outlier: { z, approvedCount: reference.length, isOutlier: z !== null && Math.abs(z) > OUTLIER_Z },
      };
    }),
    recent: recent.map((d) => ({ ...d, decidedAt: new Date(d.decidedAt).toISOString() })),
  };
}

export async function action({ request }: Route.ActionArgs) {
  return handleDecisionAction(request, { redirectTo: () => "/review", onlyPending: true });
}

export default function Review({ loaderData }: Route.ComponentProps) {
  const { queue, page, pages, total, recent } = loaderData;
  const actionData = useActionData<typeof action>();
  const navigation = useNavigation();
  const bulkRef = useRef<HTMLFormElement>(null);
  const bulkErrors =
    actionData && "result" in actionData
      ? Object.values(actionData.result.error ?? {})
          .flat()
          .filter((e): e is string => typeof e === "string")
      : [];
  const tickClearCases = () => {
    const boxes = document.querySelectorAll<HTMLInputElement>('input[form="bulk-form"][name="readingIds"]');
    boxes.forEach((box) => (box.checked = box.dataset.clear === "true"));
  };
  return (
    <>
      <PageHeader
        title="Review"
        lead={`Field readings waiting for a decision, oldest first (${total}). Approving one recomputes the module's verified power at once; the submitter is told by e-mail either way.`}
      />
      {queue.length > 0 ? (
        <Panel title="Decide several at once">
          <Form method="post" id="bulk-form" ref={bulkRef} className="space-y-2">
            <input type="hidden" name="intent" value="bulk" />
            <FormErrors errors={bulkErrors} />
            <p className="text-sm text-ink-soft">
              Tick readings below, or{" "}
              <button type="button" onClick={tickClearCases} className="underline">
                tick the clear cases
              </button>{" "}
              (no flags, not an outlier).
            </p>
            <label htmlFor="bulk-reason" className="block text-sm font-medium">
              Reason for all ticked readings <span className="font-normal text-ink-faint">(required to reject)</span>
            </label>
            <input id="bulk-reason" name="reason" className={inputClass} />
            <div className="flex flex-wrap gap-2">
              <button
                type="submit"
                name="decision"
                value="approved"
                disabled={navigation.state !== "idle"}
                className="rounded-md bg-copper px-3 py-1.5 text-sm font-medium text-sheet hover:bg-copper-dark disabled:opacity-60"
              >
                <span aria-hidden="true">✓ </span>Approve ticked
              </button>
              <button
                type="submit"
                name="decision"
                value="rejected"
                disabled={navigation.state !== "idle"}
                className="rounded-md border border-fail px-3 py-1.5 text-sm font-medium text-fail hover:bg-fail-wash disabled:opacity-60"
              >
                <span aria-hidden="true">✕ </span>Reject ticked
              </button>
            </div>
          </Form>
        </Panel>
      ) : null}
      <div className="mt-6 space-y-4">
        {queue.length === 0 ? (
          <Panel>
            <p className="flex gap-2 text-pass">
              <span aria-hidden="true">✓</span> The queue is empty: every reading has a decision.
            </p>
          </Panel>
        ) : (
          queue.map((reading) => <QueueCard key={reading.id} reading={reading} />)
        )}
      </div>
      {pages > 1 ? (
        <p className="mt-4 flex items-center gap-3 text-sm">
          {page > 1 ? <Link to={`/review?page=${page - 1}`}>← Older</Link> : null}
          <span className="figures text-ink-soft">
            Page {page} of {pages}
          </span>
          {page < pages ? <Link to={`/review?page=${page + 1}`}>Newer →</Link> : null}
        </p>
      ) : null}
      <div className="mt-8">
        <Panel title="Recently decided">
          {recent.length === 0 ? <p className="text-sm text-ink-faint">No decisions yet.</p> : null}
          <ul className="divide-y divide-rule text-sm">
            {recent.map((d) => (
              <li key={d.id} className="flex flex-wrap items-center gap-2 py-2">
                <StatusBadge status={d.decision} />
                <Link to={`/readings/${d.readingId}`} className="font-medium underline">
                  {d.maker} {d.model}
                </Link>
                <span className="figures text-ink-soft">{d.stcPmaxW.toFixed(1)} W at STC</span>
                <span className="text-ink-faint">
                  by {d.curatorName ?? "a former curator"}, {d.decidedAt.slice(0, 16).replace("T", " ")} UTC — “{d.reason}”
                </span>
              </li>
            ))}
          </ul>
        </Panel>
      </div>
    </>
  );
}
