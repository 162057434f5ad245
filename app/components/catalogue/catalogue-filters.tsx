// The catalogue's search and filters: a GET form whose fields are the URL's parameters, so a
// filtered view can be bookmarked and shared. Typing searches after a pause; a choice applies at once.
import { useEffect, useRef, type FormEvent, type ReactNode } from "react";
import { Form, Link, useSubmit } from "react-router";
import { BATTERY_CHEMISTRIES, CELL_TECHNOLOGIES, CHEMISTRY_LABELS, CONTROLLER_KINDS, INVERTER_DC_VOLTAGES, type PartKind } from "~/domain/catalogue/part-kinds";
import type { PartListQuery } from "~/lib/catalogue-query";

const fieldClass = "rounded-md border border-rule bg-sheet px-2 py-1.5 text-sm text-ink outline-none focus:border-copper";

function Labelled({ label, children }: { label: string; children: ReactNode }) {
  return (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
      {label}
      {children}
    </label>
  );
}

export function CatalogueFilters({ kind, query }: { kind: PartKind; query: PartListQuery }) {
  const submit = useSubmit();
  const timer = useRef<ReturnType<typeof setTimeout>>(undefined);
  const formRef = useRef<HTMLFormElement>(null);
  useEffect(() => () => clearTimeout(timer.current), []);
  // The fields are uncontrolled (they work without JavaScript); when the URL changes by other means
  // (Clear, back, a sort) they follow it, except the one the user is typing in.
  useEffect(() => {
    const values = fieldValues(kind, query);
    for (const [name, value] of Object.entries(values)) {
      const element = formRef.current?.elements.namedItem(name) as HTMLInputElement | HTMLSelectElement | null;
      if (element && element !== document.activeElement) element.value = value;
    }
  }, [kind, query]);

  function onChange(event: FormEvent<HTMLFormElement>) {
    const form = event.currentTarget;
    const target = event.target as HTMLInputElement;
    clearTimeout(timer.current);
    const go = () => submit(form, { replace: true, preventScrollReset: true });
    if (target.tagName === "INPUT" && (target.type === "search" || target.type === "text")) timer.current = setTimeout(go, 350);
    else go();
  }

  const f = query.modules;
  return (
    <Form
      ref={formRef}
      method="get"
      onChange={onChange}
      className="mb-4 flex flex-wrap items-end gap-3"
      role="search"
      aria-label="Search and filter the catalogue"
    >
      <input type="hidden" name="kind" value={kind} />
      <input type="hidden" name="sort" value={query.sort} />
      <input type="hidden" name="dir" value={query.dir} />
      <input type="hidden" name="limit" value={query.limit} />
      <Labelled label="Search maker or model">
        <input type="search" name="q" defaultValue={query.q} placeholder="e.g. Harrowgate 100" className={`${fieldClass} w-56`} />
      </Labelled>
      {kind === "modules" ? (
        <>
          <Labelled label="Technology">
            <select name="technology" defaultValue={f.technology ?? ""} className={fieldClass}>
              <option value="">any</option>
              {CELL_TECHNOLOGIES.map((t) => (
                <option key={t} value={t}>
                  {t}
                </option>
              ))}
            </select>
          </Labelled>
          <Labelled label="Nameplate from (W)">
            <input type="text" inputMode="decimal" name="minW" defaultValue={f.minW ?? ""} className={`${fieldClass} w-24`} />
          </Labelled>
          <Labelled label="to (W)">
            <input type="text" inputMode="decimal" name="maxW" defaultValue={f.maxW ?? ""} className={`${fieldClass} w-24`} />
          </Labelled>
          <Labelled label="Field readings">
            <select name="hasReadings" defaultValue={f.hasReadings === undefined ? "" : String(f.hasReadings)} className={fieldClass}>
              <option value="">with or without</option>
              <option value="true">with readings</option>
              <option value="false">no readings yet</option>
            </select>
          </Labelled>
          <Labelled label="Verified ÷ nameplate below">
            <select name="ratioBelow" defaultValue={f.ratioBelow === undefined ? "" : String(f.ratioBelow)} className={fieldClass}>
              <option value="">no limit</option>
              {[0.8, 0.85, 0.9, 0.95, 1].map((r) => (
                <option key={r} value={r}>
                  {Math.round(r * 100)} %
                </option>
              ))}
            </select>
          </Labelled>
        </>
      ) : null}
      {kind === "batteries" ? (
        <Labelled label="Chemistry">
          <select name="chemistry" defaultValue={query.chemistry ?? ""} className={fieldClass}>
            <option value="">any</option>
            {BATTERY_CHEMISTRIES.map((c) => (
              <option key={c} value={c}>
                {CHEMISTRY_LABELS[c]}
              </option>
            ))}
          </select>
        </Labelled>
      ) : null}
      {kind === "controllers" ? (
        <Labelled label="Type">
          <select name="type" defaultValue={query.controllerType ?? ""} className={fieldClass}>
            <option value="">PWM or MPPT</option>
            {CONTROLLER_KINDS.map((k) => (
              <option key={k} value={k}>
                {k.toUpperCase()}
              </option>
            ))}
          </select>
        </Labelled>
      ) : null}
      {kind === "inverters" ? (
        <Labelled label="Battery voltage">
          <select name="dcV" defaultValue={query.dcV ?? ""} className={fieldClass}>
            <option value="">any</option>
            {INVERTER_DC_VOLTAGES.map((v) => (
              <option key={v} value={v}>
                {v} V
              </option>
            ))}
          </select>
        </Labelled>
      ) : null}
      <button type="submit" className="rounded-md border border-ink px-3 py-1.5 text-sm font-medium hover:bg-paper-deep">
        Apply
      </button>
      <Link to={`/catalogue?kind=${kind}`} className="py-1.5 text-sm text-ink-soft underline">
        Clear
      </Link>
    </Form>
  );
}

function fieldValues(kind: PartKind, query: PartListQuery): Record<string, string> {
  const text = (v: unknown) => (v === undefined || v === null ? "" : String(v));
  const f = query.modules;
  return {
    sort: query.sort,
    dir: query.dir,
    limit: String(query.limit),
    q: query.q,
    ...(kind === "modules"
      ? { technology: text(f.technology), minW: text(f.minW), maxW: text(f.maxW), hasReadings: text(f.hasReadings), ratioBelow: text(f.ratioBelow) }
      : {}),
    ...(kind === "batteries" ? { chemistry: text(query.chemistry) } : {}),
    ...(kind === "controllers" ? { type: text(query.controllerType) } : {}),
    ...(kind === "inverters" ? { dcV: text(query.dcV) } : {}),
  };
}
