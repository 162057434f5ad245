// A reading's status as a word and an icon (never colour alone).
import { STATUS_LABEL } from "~/lib/reading-labels";

const STYLE = {
  pending: { icon: "◷", className: "border-warn bg-warn-wash text-warn" },
  approved: { icon: "✓", className: "border-pass bg-pass-wash text-pass" },
  rejected: { icon: "✕", className: "border-fail bg-fail-wash text-fail" },
} as const;

export function StatusBadge({ status }: { status: keyof typeof STATUS_LABEL }) {
  const style = STYLE[status];
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-1.5 py-0.5 text-xs font-medium ${style.className}`}>
      <span aria-hidden="true">{style.icon}</span>
      {STATUS_LABEL[status]}
    </span>
  );
}
