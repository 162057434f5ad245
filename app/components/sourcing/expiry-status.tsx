// Whether an offer's price still holds, said in a word and an icon.
export function ExpiryStatus({ validUntil, expired }: { validUntil: string | null; expired: boolean }) {
  if (expired) {
    return (
      <span
        className="inline-flex items-center gap-1 whitespace-nowrap rounded bg-warn-wash px-1.5 py-0.5 text-xs font-medium text-warn"
        data-testid="expired-flag"
      >
        <span aria-hidden="true">⚠</span> Expired {validUntil}
      </span>
    );
  }
  if (!validUntil) return <span className="text-xs text-ink-faint">no end date</span>;
  return <span className="whitespace-nowrap text-xs text-ink-soft">valid until {validUntil}</span>;
}
