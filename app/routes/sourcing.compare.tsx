// Compare the team's valid offers for one kind of part: modules per nameplate and per verified watt,
// batteries per usable and per cycled kWh, controllers and inverters by headroom, all with the landed
// cost for the quantity in the quoting currency. What to compare for sits in the URL (and, once kit
// plans exist, can come from a plan), as does the sort.
import { Link, redirect, useSearchParams, type ShouldRevalidateFunctionArgs } from "react-router";
import type { Route } from "./+types/sourcing.compare";
import { PageHeader, Panel } from "~/components/page-header";
import { CompareTable, type SortChoice } from "~/components/sourcing/compare-table";
import { moduleCompareColumns, MODULE_NUMERIC } from "~/components/sourcing/module-compare-columns";
import { NeedForm } from "~/components/sourcing/need-form";
import {
  BATTERY_NUMERIC,
  batteryCompareColumns,
  CONTROLLER_NUMERIC,
  controllerCompareColumns,
  INVERTER_NUMERIC,
  inverterCompareColumns,
} from "~/components/sourcing/part-compare-columns";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { requiredArrayPowerW } from "~/domain/sourcing/array-need";
import type { ModuleComparisonRow } from "~/domain/sourcing/module-rows";
import { isOfferPartKind, OFFER_PART_KINDS, type OfferPartKind } from "~/domain/sourcing/offer-facts";
import type { BatteryComparisonRow, ControllerComparisonRow, InverterComparisonRow } from "~/domain/sourcing/part-rows";
import { needFromSearchParams } from "~/lib/sourcing-compare-need";
import { needFromPlan } from "~/domain/sourcing/plan-need";
import { findPlan } from "~/server/plans/plans.server";
import { db } from "~/server/db.server";
import { requireTeamMember } from "~/server/guards.server";
import { compareOffers } from "~/server/sourcing/comparison.server";

const TITLES: Record<OfferPartKind, string> = { modules: "Modules", batteries: "Batteries", controllers: "Charge controllers", inverters: "Inverters" };

export const meta: Route.MetaFunction = ({ params }) => [
  { title: `Compare ${isOfferPartKind(params.kind) ? TITLES[params.kind].toLowerCase() : "offers"} · Sourcing · Kitwright` },
];

export async function loader({ request, params }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  if (!isOfferPartKind(params.kind)) throw new Response("There is no such kind of part to compare.", { status: 404 });
  const url = new URL(request.url);
  const planId = url.searchParams.get("plan");
  const plan = planId ? await findPlan(team.teamId, planId) : undefined;
  if (planId && !plan) throw new Response("No such plan in your team.", { status: 404 });
  if (plan && !url.searchParams.has("filled")) {
    // Fill the comparison's fields from the plan once, then keep them in the address like typed ones.
    const fromPlan = needFromPlan(plan.revision.result, plan.revision.inputs.design);
    const next = new URLSearchParams(url.searchParams);
    const set = (key: string, value: number | null, digits = 2) => (value === null ? next.delete(key) : next.set(key, String(Number(value.toFixed(digits)))));
    set("energy", fromPlan.energy, 3);
    set("sun", fromPlan.sun);
    set("losses", fromPlan.losses, 1);
    set("bank", fromPlan.bank, 0);
    set("store", fromPlan.store, 3);
    set("btemp", fromPlan.batteryTempC, 1);
    set("dod", fromPlan.dodLimitPct, 0);
    set("array", fromPlan.array, 0);
    set("peak", fromPlan.peak, 0);
    // Modules and batteries are counted per model from the need; one controller and one inverter.
    set("qty", params.kind === "modules" || params.kind === "batteries" ? null : 1, 0);
    next.set("filled", "1");
    throw redirect(`${url.pathname}?${next}`);
  }
  const { need, values, errors } = needFromSearchParams(params.kind, url.searchParams);
  const comparison = await compareOffers(db, team.teamId, params.kind, need);
  return { kind: params.kind, values, errors, comparison, plan: plan ? { id: plan.plan.id, name: plan.plan.name } : null };
}

/** Sorting happens in the browser: a change of sort alone needs no new data. */
export function shouldRevalidate({ currentUrl, nextUrl, defaultShouldRevalidate }: ShouldRevalidateFunctionArgs) {
  if (currentUrl.pathname !== nextUrl.pathname) return defaultShouldRevalidate;
  const strip = (u: URL) => {
    const p = new URLSearchParams(u.search);
    p.delete("sort");
    p.delete("dir");
    p.sort();
    return p.toString();
  };
  return strip(currentUrl) !== strip(nextUrl) ? defaultShouldRevalidate : false;
}

function NeedSummary({ kind, need }: { kind: OfferPartKind; need: Route.ComponentProps["loaderData"]["comparison"]["need"] }) {
  if (kind === "modules") {
    if (need.quantity !== null) return <>{need.quantity} modules of each offer.</>;
    const arrayW = requiredArrayPowerW(need.arrayEnergyWhPerDay, need.sunHoursPerDay, need.systemLossesPct);
    return (
      <>
        {(need.arrayEnergyWhPerDay / 1000).toLocaleString("en-GB")} kWh a day at {need.sunHoursPerDay} sun hours with {need.systemLossesPct} % losses needs{" "}
        <strong className="figures">{Math.round(arrayW).toLocaleString("en-GB")} W</strong> of array at STC; each module is counted on its verified power where
        readings exist, else on its nameplate (a peak-sun-hours estimate — common practice, no source).
      </>
    );
  }
  if (kind === "batteries") {
    if (need.quantity !== null) return <>{need.quantity} batteries of each offer.</>;
    return (
      <>
        Each battery is counted for a {need.batteryVoltageV} V bank that holds{" "}
        <strong className="figures">{(need.bankUsableWh / 1000).toLocaleString("en-GB")} kWh</strong> usable at {need.batteryTempC} °C: enough in series for the
        voltage, and strings in parallel for the energy at its own depth of discharge
        {need.maxDepthOfDischargePct === null ? "" : ` (at most ${need.maxDepthOfDischargePct} %)`} and its capacity at that temperature — the kit plan's own
        bank rule.
      </>
    );
  }
  if (kind === "controllers")
    return (
      <>
        {need.quantity} controller(s), for a {need.arrayPowerW.toLocaleString("en-GB")} W array on a {need.batteryVoltageV} V bank.
      </>
    );
  return (
    <>
      {need.quantity} inverter(s), for a {need.peakAcLoadW.toLocaleString("en-GB")} W peak AC load on a {need.batteryVoltageV} V bank.
    </>
  );
}

export default function Compare({ loaderData }: Route.ComponentProps) {
  const { kind, comparison, values, errors, plan } = loaderData;
  const [params, setParams] = useSearchParams();
  const sort: SortChoice = { id: params.get("sort") ?? "landed", desc: params.get("dir") === "desc" };
  const onSort = (choice: SortChoice) =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        next.set("sort", choice.id);
        next.set("dir", choice.desc ? "desc" : "asc");
        return next;
      },
      { replace: true, preventScrollReset: true },
    );
  const need = Object.fromEntries([...params].filter(([k]) => k !== "sort" && k !== "dir"));
  // From a plan, another kind of part takes its own figures from the plan again.
  const keep = plan ? `plan=${plan.id}` : new URLSearchParams(need).toString();
  const caption = `${TITLES[kind]} offers compared, in ${comparison.pricing.quotingCurrency}`;
  const rows = comparison.rows;
  return (
    <>
      <PageHeader
        title={`Compare ${TITLES[kind].toLowerCase()}`}
        lead={`Your team's valid offers, priced in ${comparison.pricing.quotingCurrency} on ${comparison.pricing.asOf} with your own exchange rates. Click a column heading to rank by it.`}
      />
      <SourcingTabs />
      <nav aria-label="Kind of part" className="mb-4 flex flex-wrap gap-1 text-sm">
        {OFFER_PART_KINDS.map((k) => (
          <Link
            key={k}
            to={`/sourcing/compare/${k}${keep ? `?${keep}` : ""}`}
            aria-current={k === kind ? "page" : undefined}
            className={`rounded px-3 py-1.5 ${k === kind ? "bg-copper-wash font-medium" : "text-ink-soft hover:text-ink"}`}
          >
            {TITLES[k]}
          </Link>
        ))}
      </nav>
      <div className="space-y-4">
        <Panel title="Compare for">
          <NeedForm kind={kind} values={values} errors={errors} sort={{ id: sort.id, dir: sort.desc ? "desc" : "asc" }} />
          <p className="mt-3 text-sm text-ink-soft" data-testid="need-summary">
            <NeedSummary kind={kind} need={comparison.need} />{" "}
            {plan ? (
              <>
                Figures taken from the plan{" "}
                <Link to={`/plans/${plan.id}`} className="underline">
                  {plan.name}
                </Link>{" "}
                (its design month; other modules are assumed to lose the same share as the plan's own). Change them to explore.
              </>
            ) : (
              "Type the figures, or open this page from a kit plan; they stay in the page address."
            )}
          </p>
        </Panel>
        {comparison.expiredCount ? (
          <p className="rounded-md bg-warn-wash px-3 py-2 text-sm text-warn" role="note">
            <span aria-hidden="true">⚠</span> {comparison.expiredCount} expired offer{comparison.expiredCount === 1 ? " is" : "s are"} left out.{" "}
            <Link to={`/sourcing?kind=${kind}`} className="underline">
              See them in the offer list
            </Link>
            .
          </p>
        ) : null}
        <Panel>
          {kind === "modules" ? (
            <CompareTable
              columns={moduleCompareColumns()}
              data={rows as ModuleComparisonRow[]}
              sort={sort}
              onSort={onSort}
              caption={caption}
              numericColumns={MODULE_NUMERIC}
            />
          ) : kind === "batteries" ? (
            <CompareTable
              columns={batteryCompareColumns(comparison.need.batteryVoltageV)}
              data={rows as BatteryComparisonRow[]}
              sort={sort}
              onSort={onSort}
              caption={caption}
              numericColumns={BATTERY_NUMERIC}
            />
          ) : kind === "controllers" ? (
            <CompareTable
              columns={controllerCompareColumns(comparison.need.batteryVoltageV, comparison.need.arrayPowerW)}
              data={rows as ControllerComparisonRow[]}
              sort={sort}
              onSort={onSort}
              caption={caption}
              numericColumns={CONTROLLER_NUMERIC}
            />
          ) : (
            <CompareTable
              columns={inverterCompareColumns(comparison.need.batteryVoltageV, comparison.need.peakAcLoadW)}
              data={rows as InverterComparisonRow[]}
              sort={sort}
              onSort={onSort}
              caption={caption}
              numericColumns={INVERTER_NUMERIC}
            />
          )}
          <Footnotes kind={kind} />
        </Panel>
      </div>
    </>
  );
}

function Footnotes({ kind }: { kind: OfferPartKind }) {
  return (
    <ul className="mt-4 space-y-1 text-xs text-ink-faint">
      {kind === "modules" ? (
        <>
          <li>
            Price per watt = unit price at the quantity bought ÷ the module's power. Verified power is the median of the catalogue's approved field readings,
            normalised to STC; "no readings" means nameplate only.
          </li>
          <li>Measured W/m² = verified power ÷ the module's outline area; area needed = modules × outline area.</li>
        </>
      ) : null}
      {kind === "batteries" ? (
        <li>
          Usable kWh = nominal V × capacity Ah × usable depth of discharge. Bank: batteries in series = bank V ÷ the battery's voltage class; strings in
          parallel = usable energy ÷ (depth of discharge × capacity left at the temperature) ÷ bank V ÷ Ah, rounded up. Price per cycled kWh = unit price ÷
          (usable kWh × rated cycles): purchase price only, before charging losses and ageing.
        </li>
      ) : null}
      {kind === "controllers" ? (
        <li>
          Charge current ≈ array power ÷ bank voltage (cautious: conversion losses ignored). The string's cold-morning Voc against the controller's limit is
          checked in the kit plan.
        </li>
      ) : null}
      <li>
        Landed = goods at the price break for the quantity bought (raised to the minimum order) + shipping per unit and per order, each rounded once; converted
        totals are rounded once more. Expired offers are left out.
      </li>
    </ul>
  );
}
