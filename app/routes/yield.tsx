// The yield page: a site and a module in, energy per module per month out, recalculated through
// POST /api/v1/yield as the installer edits.
import { useEffect, useRef, useState } from "react";
import { useFetcher } from "react-router";
import type { Route } from "./+types/yield";
import { PageHeader, Panel } from "~/components/page-header";
import { ClimateTable } from "~/components/yield/climate-table";
import { EquipmentInputs } from "~/components/yield/equipment-inputs";
import { SiteInputs } from "~/components/yield/site-inputs";
import { YieldChart } from "~/components/yield/yield-chart";
import { YieldResults } from "~/components/yield/yield-results";
import type { YieldResult } from "~/domain/solar/yield-types";
import { defaultYieldForm } from "~/lib/yield-defaults";
import { toRequestBody, type MonthRow, type YieldFormState } from "~/lib/yield-form";
import { requireStaff } from "~/server/guards.server";
import { listModules } from "~/server/modules.server";
import { computeYield } from "~/server/yield.server";
import { skipAfterPreview } from "~/lib/preview-revalidation";

export const shouldRevalidate = skipAfterPreview;

export const meta: Route.MetaFunction = () => [{ title: "Site yield · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  await requireStaff(request);
  const { items } = await listModules({ search: "", limit: 200, offset: 0 });
  // Start from the catalogue module nearest 100 W: a typical size for a small off-grid kit.
  const start = [...items].sort((a, b) => Math.abs(a.pmax_w - 100) - Math.abs(b.pmax_w - 100))[0];
  const form = defaultYieldForm(start?.id ?? "");
  const initial = await computeYield(toRequestBody(form));
  return {
    modules: items.map((m) => ({ id: m.id, label: `${m.maker} ${m.model} — ${m.pmax_w} W ${m.cell_technology}` })),
    form,
    initial: initial.ok ? initial.result : null,
  };
}

type ApiAnswer = YieldResult | { error: { message: string; fields?: Record<string, string> } };

export default function YieldPage({ loaderData }: Route.ComponentProps) {
  const [state, setState] = useState<YieldFormState>(loaderData.form);
  const fetcher = useFetcher<ApiAnswer>();
  const firstRender = useRef(true);
  const [result, setResult] = useState<YieldResult | null>(loaderData.initial);

  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    const timer = setTimeout(() => {
      fetcher.submit(toRequestBody(state) as never, { method: "post", action: "/api/v1/yield", encType: "application/json" });
    }, 350);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [state]);

  const answer = fetcher.data;
  const error = answer && "error" in answer ? answer.error : null;
  useEffect(() => {
    if (answer && !("error" in answer)) setResult(answer);
  }, [answer]);

  const errors = error?.fields ?? {};
  const pending = fetcher.state !== "idle";
  const update = (patch: Partial<YieldFormState>) => setState((s) => ({ ...s, ...patch }));
  const updateMonth = (index: number, patch: Partial<MonthRow>) =>
    setState((s) => ({ ...s, months: s.months.map((m, i) => (i === index ? { ...m, ...patch } : m)) }));

  return (
    <>
      <PageHeader
        title="Site yield"
        lead="Energy one module delivers to the battery each month at a site, from the monthly climate, the array's tilt and facing, cell temperature, the controller and named losses."
      />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,26rem)_minmax(0,1fr)]">
        <div className="space-y-6">
          <Panel title="Site">
            <SiteInputs state={state} errors={errors} update={update} />
          </Panel>
          <Panel title="Monthly climate">
            <ClimateTable state={state} errors={errors} onMonth={updateMonth} />
          </Panel>
          <Panel title="Module, controller and losses">
            <EquipmentInputs state={state} errors={errors} update={update} modules={loaderData.modules} />
          </Panel>
        </div>
        <div className="space-y-4">
          <div aria-live="polite" className="min-h-6 text-sm">
            {pending ? <span className="text-ink-soft">⟳ Recalculating…</span> : null}
            {error && !pending ? (
              <span className="text-fail" role="alert">
                ✕ {error.message} The figures below are from the last valid input.
              </span>
            ) : null}
          </div>
          {result ? (
            <div className={pending ? "opacity-60 transition-opacity" : "transition-opacity"}>
              <Panel title="Energy per module">
                <YieldChart months={result.months} />
                <div className="mt-4">
                  <YieldResults result={result} />
                </div>
              </Panel>
            </div>
          ) : (
            <p className="text-ink-soft">Enter a site and a module to see the monthly energy.</p>
          )}
        </div>
      </div>
    </>
  );
}
