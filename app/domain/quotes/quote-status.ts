// A quote's life: draft → sent → viewed → approved / declined / expired → deposit paid, or withdrawn
// by the team. What each party may do follows from the status alone, so routes and tests share it.

export const QUOTE_STATUSES = ["draft", "sent", "viewed", "approved", "declined", "expired", "withdrawn", "deposit_paid"] as const;
export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

export const STATUS_LABELS: Record<QuoteStatus, string> = {
  draft: "Draft",
  sent: "Sent",
  viewed: "Opened by customer",
  approved: "Approved",
  declined: "Declined",
  expired: "Expired",
  withdrawn: "Withdrawn",
  deposit_paid: "Deposit paid",
};

/** Sent or opened, but past its validity date: the customer can no longer approve it. */
export function effectiveStatus(status: QuoteStatus, validUntil: string | null, today: string): QuoteStatus {
  if ((status === "sent" || status === "viewed") && validUntil !== null && validUntil < today) return "expired";
  return status;
}

/** The team may change the lines (a sent quote gets a new revision) until the customer has decided. */
export function teamCanRevise(status: QuoteStatus) {
  return status === "draft" || status === "sent" || status === "viewed" || status === "expired" || status === "declined" || status === "withdrawn";
}

/** Sending (or sending again) needs a revision the customer has not decided on. */
export function teamCanSend(status: QuoteStatus) {
  return teamCanRevise(status);
}

export function teamCanWithdraw(status: QuoteStatus) {
  return status === "sent" || status === "viewed" || status === "expired";
}

export function customerCanDecide(status: QuoteStatus) {
  return status === "sent" || status === "viewed";
}

export function customerCanPay(status: QuoteStatus) {
  return status === "approved";
}

/** Statuses the customer can see at all (a withdrawn or never-sent quote is not theirs to read). */
export function visibleToCustomer(status: QuoteStatus) {
  return status !== "draft" && status !== "withdrawn";
}

export function formatQuoteNumber(n: number) {
  return `Q-${String(n).padStart(4, "0")}`;
}
