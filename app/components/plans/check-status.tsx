// A check's status said in a word and an icon; colour only repeats what the word says.
import type { CheckKind, CheckStatus } from "~/domain/sizing/checks";

export const STATUS_LOOK: Record<CheckStatus, { icon: string; word: string; className: string }> = {
  pass: { icon: "✓", word: "Pass", className: "border-pass bg-pass-wash text-pass" },
  warn: { icon: "⚠", word: "Warning", className: "border-warn bg-warn-wash text-warn" },
  fail: { icon: "✕", word: "Fail", className: "border-fail bg-fail-wash text-fail" },
};

export const KIND_WORD: Record<CheckKind, string> = {
  safety: "Safety",
  performance: "Performance",
  advisory: "Advisory",
};

export function CheckStatusMark({ status }: { status: CheckStatus }) {
  const look = STATUS_LOOK[status];
  return (
    <span className={`inline-flex shrink-0 items-center gap-1 rounded border px-1.5 py-0.5 text-xs font-semibold ${look.className}`}>
      <span aria-hidden="true">{look.icon}</span>
      {look.word}
    </span>
  );
}
