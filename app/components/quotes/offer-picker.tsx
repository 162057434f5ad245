// Under a kit-part line: which of the team's offers the cost comes from. Picking another offer sets
// the line's unit cost to that offer's landed cost per unit at the saved quantity.
export interface OfferChoice {
  offerId: string;
  supplierName: string;
  unitCost: string;
}

export function OfferPicker({
  index,
  choices,
  offerId,
  currency,
  onPick,
}: {
  index: number;
  /** Null for lines that are not kit parts. */
  choices: OfferChoice[] | null;
  offerId: string | undefined;
  currency: string;
  onPick: (choice: OfferChoice) => void;
}) {
  if (choices === null) return null;
  if (choices.length === 0) return <p className="mt-1 text-xs text-warn">⚠ No valid offer for this part: enter the cost you expect.</p>;
  const known = choices.some((c) => c.offerId === offerId);
  return (
    <select
      aria-label={`Line ${index + 1} offer`}
      value={known ? offerId : ""}
      onChange={(e) => {
        const choice = choices.find((c) => c.offerId === e.target.value);
        if (choice) onPick(choice);
      }}
      className="mt-1 w-full rounded border border-rule bg-paper px-2 py-0.5 text-xs text-ink-soft"
    >
      {known ? null : <option value="">Own cost (no offer)</option>}
      {choices.map((c, k) => (
        <option key={c.offerId} value={c.offerId}>
          {c.supplierName}: {currency} {c.unitCost} a unit landed{k === 0 ? " (cheapest)" : ""}
        </option>
      ))}
    </select>
  );
}
