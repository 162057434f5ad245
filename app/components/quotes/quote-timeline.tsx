// Every status change with its time and who made it, oldest first.
import { formatDate } from "~/lib/plan-format";

const WORDS: Record<string, string> = {
  created: "Drafted",
  revised: "New revision",
  sent: "Sent",
  resent: "Sent again",
  viewed: "Opened by the customer",
  approved: "Approved",
  declined: "Declined",
  expired: "Expired",
  withdrawn: "Withdrawn",
  payment_started: "Deposit payment started",
  payment_failed: "Deposit payment failed",
  deposit_paid: "Deposit paid",
  payment_duplicate: "Second payment received (refund it)",
};

export interface TimelineEvent {
  id: string;
  kind: string;
  revision: number | null;
  actor_name: string;
  detail: string;
  at: Date | string;
}

export function QuoteTimeline({ events }: { events: TimelineEvent[] }) {
  return (
    <ol className="space-y-3 border-l-2 border-rule pl-4 text-sm" data-testid="quote-timeline">
      {events.map((e) => (
        <li key={e.id} className="relative">
          <span aria-hidden="true" className="absolute top-1.5 -left-[1.4rem] h-2.5 w-2.5 rounded-full border-2 border-copper bg-sheet" />
          <p>
            <span className="font-semibold">{WORDS[e.kind] ?? e.kind}</span>
            {e.revision ? <span className="text-ink-soft"> · revision {e.revision}</span> : null}
          </p>
          <p className="text-ink-soft">
            <time dateTime={new Date(e.at).toISOString()}>
              {formatDate(e.at)} {new Date(e.at).toISOString().slice(11, 16)} UTC
            </time>{" "}
            · {e.actor_name}
          </p>
          {e.detail ? <p className="text-ink">{e.detail}</p> : null}
        </li>
      ))}
    </ol>
  );
}
