// Numbers with their units, where they come from, and the verified ratio said in words and an icon.
import { powerOrigin, ratioStanding } from "~/domain/catalogue/derived-figures";

export function formatNumber(value: number | null | undefined, decimals = 0) {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return value.toLocaleString("en-GB", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
}

/** A value with its unit, never split across lines; "—" when unknown. */
export function Num({ value, unit, decimals = 0 }: { value: number | null | undefined; unit?: string; decimals?: number }) {
  if (value === null || value === undefined || !Number.isFinite(value)) return <span className="text-ink-faint">—</span>;
  return (
    <span className="figures whitespace-nowrap">
      {formatNumber(value, decimals)}
      {unit ? <span className="text-ink-soft"> {unit}</span> : null}
    </span>
  );
}

/** Where a module's power figure comes from: "nameplate only — no readings yet" or "verified from N readings". */
export function Origin({ readingCount }: { readingCount: number }) {
  return <span className="text-xs text-ink-faint">{powerOrigin(readingCount)}</span>;
}

const STANDING = {
  below: { icon: "▼", word: "below nameplate", className: "text-fail" },
  near: { icon: "●", word: "near nameplate", className: "text-pass" },
  above: { icon: "▲", word: "above nameplate", className: "text-pass" },
} as const;

export function RatioBadge({ ratio, compact = false }: { ratio: number | null; compact?: boolean }) {
  if (ratio === null) return <span className="text-xs text-ink-faint">no readings yet</span>;
  const s = STANDING[ratioStanding(ratio)];
  return (
    <span className="figures whitespace-nowrap">
      {formatNumber(100 * ratio, 0)} %{" "}
      <span className={`text-xs ${s.className}`}>
        <span aria-hidden="true">{s.icon}</span> {compact ? s.word.split(" ")[0] : s.word}
      </span>
    </span>
  );
}
