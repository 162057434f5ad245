// The load sheet editor: add and remove appliance lines inline; totals follow every keystroke.
import { useState } from "react";
import { Form, useNavigation } from "react-router";
import { SubmitButton } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import type { InverterLoadParams } from "~/domain/load/load-sheet-types";
import { draftToAppliance, draftToPayload, newDraft } from "~/lib/load-sheet-drafts";
import { ApplianceRow, type ApplianceDraft } from "./appliance-row";
import { LoadTotals } from "./load-totals";

export interface InverterChoice {
  id: string;
  label: string;
  params: InverterLoadParams;
}

export const ASSUMED_INVERTER: InverterChoice = {
  id: "",
  label: "An assumed inverter: 90 % efficient, 10 W idle",
  params: { efficiencyPct: 90, idleDrawW: 10 },
};

export function LoadSheetEditor({
  initialName,
  initialRows,
  inverters,
  errors,
  submitLabel,
}: {
  initialName: string;
  initialRows: ApplianceDraft[];
  inverters: InverterChoice[];
  errors: Record<string, string>;
  submitLabel: string;
}) {
  const navigation = useNavigation();
  const [name, setName] = useState(initialName);
  const [rows, setRows] = useState<ApplianceDraft[]>(initialRows.length ? initialRows : [newDraft()]);
  const [inverterId, setInverterId] = useState("");
  const inverter = inverters.find((i) => i.id === inverterId) ?? ASSUMED_INVERTER;
  const appliances = rows.map(draftToAppliance);
  const sheet = JSON.stringify({ name, appliances: rows.map(draftToPayload) });
  return (
    <Form method="post" className="space-y-6">
      <input type="hidden" name="sheet" value={sheet} />
      {errors.sheet || errors.appliances ? <p className="text-sm text-fail">✕ {errors.sheet ?? errors.appliances}</p> : null}
      <div className="max-w-md">
        <label htmlFor="sheet-name" className="mb-1 block text-sm font-medium">
          Load sheet name
        </label>
        <input
          id="sheet-name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          aria-invalid={errors.name ? true : undefined}
          className="block w-full rounded-md border border-rule bg-sheet px-3 py-2"
        />
        {errors.name ? <p className="mt-1 text-sm text-fail">✕ {errors.name}</p> : null}
      </div>
      <Panel title="Appliances">
        <div className="overflow-x-auto">
          <table className="w-full min-w-[56rem] text-left text-sm">
            <thead className="text-xs text-ink-faint">
              <tr>
                <th className="px-1 font-medium">Appliance</th>
                <th className="px-1 font-medium">Power (W)</th>
                <th className="px-1 font-medium">How many at once</th>
                <th className="px-1 font-medium">Hours/day</th>
                <th className="px-1 font-medium">Days/week</th>
                <th className="px-1 font-medium">Circuit</th>
                <th className="px-1 font-medium">Surge (W)</th>
                <th className="px-1 font-medium">Months</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {rows.map((row, index) => (
                <ApplianceRow
                  key={row.key}
                  row={row}
                  index={index}
                  errors={errors}
                  onChange={(patch) => setRows((rs) => rs.map((r, i) => (i === index ? { ...r, ...patch } : r)))}
                  onRemove={() => setRows((rs) => rs.filter((_, i) => i !== index))}
                />
              ))}
            </tbody>
          </table>
        </div>
        <button
          type="button"
          onClick={() => setRows((rs) => [...rs, newDraft()])}
          className="mt-3 rounded-md border border-rule px-3 py-1.5 text-sm hover:bg-paper-deep"
        >
          + Add an appliance
        </button>
      </Panel>
      <Panel title="Totals">
        <div className="mb-3 max-w-md text-sm">
          <label htmlFor="totals-inverter" className="mb-1 block font-medium">
            AC through
          </label>
          <select
            id="totals-inverter"
            value={inverterId}
            onChange={(e) => setInverterId(e.target.value)}
            className="block w-full rounded-md border border-rule bg-sheet px-3 py-2"
          >
            <option value="">{ASSUMED_INVERTER.label}</option>
            {inverters.map((i) => (
              <option key={i.id} value={i.id}>
                {i.label}
              </option>
            ))}
          </select>
          <p className="mt-1 text-xs text-ink-faint">The kit plan uses the inverter it chooses; this only previews the totals.</p>
        </div>
        <LoadTotals appliances={appliances.filter((a) => a !== null)} skipped={appliances.filter((a) => a === null).length} inverter={inverter.params} />
      </Panel>
      <SubmitButton pending={navigation.state === "submitting"}>{submitLabel}</SubmitButton>
    </Form>
  );
}
