// Every string layout the planner weighed: the voltages on the coldest morning and the hottest
// afternoon against what the controller and battery need, the controller's current, and why a layout
// is not valid, in plain words. The chosen layout is marked with a word.
import type { LayoutEvaluation } from "~/domain/sizing/string-layout";
import { formatNumber, layoutWords } from "~/lib/plan-format";

export function LayoutOptions({
  layouts,
  chosen,
  forced = false,
  controller,
}: {
  layouts: readonly LayoutEvaluation[];
  chosen: LayoutEvaluation;
  /** The installer set the layout by hand (ArrayPlan.layoutForced). */
  forced?: boolean;
  /** The controller's limits, when the page has them, to print beside the figures. */
  controller?: { maxPvVocV: number; maxChargeCurrentA: number };
}) {
  const isChosen = (l: LayoutEvaluation) => l.modulesInSeries === chosen.modulesInSeries && l.stringsInParallel === chosen.stringsInParallel;
  // A layout set by hand may not be among the listed ones: show it first so it is never missing.
  const rows = layouts.some(isChosen) ? layouts : [chosen, ...layouts];
  return (
    <div>
      <div className="overflow-x-auto">
        <table className="figures w-full min-w-[44rem] text-right text-sm">
          <caption className="sr-only">String layouts considered</caption>
          <thead className="border-b border-rule text-xs text-ink-faint">
            <tr>
              <th scope="col" className="py-2 text-left font-medium">
                Layout
              </th>
              <th scope="col" className="px-2 font-medium">
                Array W at STC
              </th>
              <th scope="col" className="px-2 font-medium">
                Voc coldest morning
              </th>
              <th scope="col" className="px-2 font-medium">
                Vmp hot afternoon
              </th>
              <th scope="col" className="px-2 font-medium">
                Controller current
              </th>
              <th scope="col" className="pl-2 text-left font-medium">
                Verdict
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {rows.map((l) => {
              const picked = isChosen(l);
              return (
                <tr
                  key={`${l.modulesInSeries}x${l.stringsInParallel}`}
                  className={`align-top *:py-1.5 ${picked ? "bg-copper-wash" : ""}`}
                  data-chosen={picked || undefined}
                >
                  <th scope="row" className="py-1.5 text-left font-normal">
                    <span className="whitespace-nowrap">{layoutWords(l.modulesInSeries, l.stringsInParallel)}</span>
                    <span className="block text-xs text-ink-faint">{l.moduleCount} modules</span>
                    {picked ? <span className="block text-xs font-semibold text-copper-dark">◆ Chosen{forced ? " (set by hand)" : ""}</span> : null}
                  </th>
                  <td className="px-2">{formatNumber(l.arrayStcPowerW)} W</td>
                  <td className="px-2">
                    <Pair value={l.stringVocColdV} against={controller?.maxPvVocV} sign="≤" unit="V" status={l.vocOk ? "pass" : "fail"} words={VOC_WORDS} />
                  </td>
                  <td className="px-2">
                    <Pair value={l.stringVmpHotV} against={l.stringVmpNeededV} sign="≥" unit="V" status={l.vmpStatus} words={VMP_WORDS} />
                  </td>
                  <td className="px-2">
                    <Pair
                      value={l.controllerOutputCurrentA}
                      against={controller?.maxChargeCurrentA}
                      sign="≤"
                      unit="A"
                      status={l.currentStatus}
                      words={CURRENT_WORDS}
                    />
                  </td>
                  <td className="pl-2 text-left">
                    <span className={`inline-flex items-center gap-1 whitespace-nowrap text-xs font-semibold ${l.valid ? "text-pass" : "text-fail"}`}>
                      <span aria-hidden="true">{l.valid ? "✓" : "✕"}</span>
                      {l.valid ? "Valid" : "Not valid"}
                    </span>
                    {l.problems.length > 0 ? (
                      <ul className="mt-1 list-disc pl-4 text-xs text-ink-soft">
                        {l.problems.map((p) => (
                          <li key={p}>{p}</li>
                        ))}
                      </ul>
                    ) : null}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="mt-2 text-xs text-ink-faint">
        Voc on the coldest morning must stay at or below the controller's maximum input voltage. Vmp on a hot afternoon must stay at or above the battery's
        charging voltage plus the tracker's headroom (MPPT) or the switch and cable drop (PWM). Controller current: what an MPPT controller delivers to the
        battery at the array's STC power, or 1.25 × the array's short-circuit current through a PWM controller.
      </p>
    </div>
  );
}

type Status = "pass" | "warn" | "fail";

const VOC_WORDS: Record<Status, string> = { pass: "within limit", warn: "near limit", fail: "over limit" };
const VMP_WORDS: Record<Status, string> = { pass: "enough", warn: "low: less harvest", fail: "too low to charge" };
const CURRENT_WORDS: Record<Status, string> = { pass: "within rating", warn: "near rating", fail: "over rating" };
const LOOK: Record<Status, { icon: string; className: string }> = {
  pass: { icon: "✓", className: "text-pass" },
  warn: { icon: "⚠", className: "text-warn" },
  fail: { icon: "✕", className: "text-fail" },
};

function Pair(props: { value: number; against: number | undefined; sign: "≤" | "≥"; unit: string; status: Status; words: Record<Status, string> }) {
  const look = LOOK[props.status];
  return (
    <span className="block whitespace-nowrap">
      {formatNumber(props.value, 1)} {props.unit}
      {props.against !== undefined ? (
        <span className="text-ink-faint">
          {" "}
          {props.sign} {formatNumber(props.against, 1)} {props.unit}
        </span>
      ) : null}
      <span className={`block text-xs ${look.className}`}>
        <span aria-hidden="true">{look.icon} </span>
        {props.words[props.status]}
      </span>
    </span>
  );
}
