import type { Flash } from "~/lib/flash";

const STYLE: Record<Flash["kind"], { icon: string; label: string; className: string }> = {
  success: { icon: "✓", label: "Done", className: "border-pass bg-pass-wash text-pass" },
  info: { icon: "ℹ", label: "Note", className: "border-rule bg-sheet text-ink" },
  error: { icon: "✕", label: "Problem", className: "border-fail bg-fail-wash text-fail" },
};

export function FlashBanner({ flash }: { flash: Flash }) {
  const style = STYLE[flash.kind];
  return (
    <div role="status" className={`no-print mb-4 flex items-start gap-2 rounded-lg border px-4 py-3 text-sm ${style.className}`}>
      <span aria-hidden="true">{style.icon}</span>
      <span>
        <strong className="font-semibold">{style.label}: </strong>
        {flash.message}
      </span>
    </div>
  );
}
