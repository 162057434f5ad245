// Delivers events to the app the way Stripe does: a JSON POST signed with the endpoint's
// secret (Stripe-Signature, re-signed per attempt), retried with backoff when the app answers
// non-2xx or is unreachable. Every attempt is recorded for GET /_fake/deliveries.
import Stripe from "stripe";
import type { Delivery, StripeEvent } from "./payments-state.ts";

export type WebhookSenderOptions = {
  url: string | undefined;
  secret: string;
  /** Waits before attempts 2, 3, …; Stripe itself backs off over days, a fake over seconds. */
  retryDelaysMs: number[];
  record: (delivery: Delivery) => void;
  log: (line: string) => void;
};

export type WebhookSender = {
  /** Resolves after the first attempt; later retries run in the background. */
  deliver(event: StripeEvent): Promise<Delivery | null>;
  /** Drops scheduled retries (used by POST /_fake/reset). */
  cancelRetries(): void;
  close(): void;
};

const ATTEMPT_TIMEOUT_MS = 10_000;

export function createWebhookSender(options: WebhookSenderOptions): WebhookSender {
  const timers = new Set<NodeJS.Timeout>();
  let closed = false;

  async function attempt(event: StripeEvent, url: string, attemptNo: number): Promise<Delivery> {
    const payload = JSON.stringify(event, null, 2);
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: options.secret });
    const started = Date.now();
    let statusCode: number | null = null;
    let error: string | null = null;
    try {
      const response = await fetch(url, {
        method: "POST",
        headers: {
          "Content-Type": "application/json; charset=utf-8",
          "Stripe-Signature": signature,
          "User-Agent": "kitwright-payments-fake/1.0",
        },
        body: payload,
        signal: AbortSignal.timeout(ATTEMPT_TIMEOUT_MS),
      });
      statusCode = response.status;
      await response.arrayBuffer().catch(() => undefined);
    } catch (caught) {
      // fetch says only "fetch failed"; the cause says why (ECONNREFUSED, a timeout, …).
      const cause = (caught as { cause?: { code?: string; message?: string } }).cause;
      error = cause?.code ?? cause?.message ?? (caught as Error).message;
    }
    const delivery: Delivery = {
      eventId: event.id,
      eventType: event.type,
      url,
      attempt: attemptNo,
      at: new Date(started).toISOString(),
      statusCode,
      error,
      durationMs: Date.now() - started,
    };
    options.record(delivery);
    const outcome = statusCode !== null ? `HTTP ${statusCode}` : `failed (${error})`;
    options.log(`payments fake: ${event.type} ${event.id} → ${url} attempt ${attemptNo}: ${outcome}`);
    if (!isSuccess(delivery)) scheduleRetry(event, url, attemptNo);
    return delivery;
  }

  function cancelRetries(): void {
    for (const timer of timers) clearTimeout(timer);
    timers.clear();
  }

  function scheduleRetry(event: StripeEvent, url: string, attemptNo: number): void {
    const delay = options.retryDelaysMs[attemptNo - 1];
    if (closed) return;
    if (delay === undefined) {
      options.log(`payments fake: giving up on ${event.id} after ${attemptNo} attempts`);
      return;
    }
    const timer = setTimeout(() => {
      timers.delete(timer);
      void attempt(event, url, attemptNo + 1);
    }, delay);
    timers.add(timer);
  }

  return {
    async deliver(event) {
      if (!options.url) {
        options.log(`payments fake: ${event.type} ${event.id} recorded; no WEBHOOK_URL to deliver to`);
        return null;
      }
      return attempt(event, options.url, 1);
    },
    cancelRetries,
    close() {
      closed = true;
      cancelRetries();
    },
  };
}

function isSuccess(delivery: Delivery): boolean {
  return delivery.statusCode !== null && delivery.statusCode >= 200 && delivery.statusCode < 300;
}
