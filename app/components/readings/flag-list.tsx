// The conditions that make a reading less trustworthy, each with its reason.
export function FlagList({ flags, empty = "No flags: the conditions were good." }: { flags: { code: string; message: string }[]; empty?: string }) {
  if (flags.length === 0) {
    return (
      <p className="flex gap-1 text-sm text-pass">
        <span aria-hidden="true">✓</span>
        {empty}
      </p>
    );
  }
  return (
    <ul className="space-y-1.5 text-sm" aria-label="Flags">
      {flags.map((flag, i) => (
        <li key={`${flag.code}-${i}`} className="flex gap-2 rounded-md border border-warn bg-warn-wash px-2 py-1.5 text-ink">
          <span aria-hidden="true" className="text-warn">
            ⚑
          </span>
          <span>
            <span className="font-medium">Flagged:</span> {flag.message}
          </span>
        </li>
      ))}
    </ul>
  );
}
