// Local stand-in for Stripe: enough of the API for Checkout, a hosted test payment page and
// signed webhooks to the app. Run: `tsx fakes/payments-server.ts`, or start it in-process.
import { createServer } from "node:http";
import { closeHttpServer, isMainModule, listen, LOOPBACK, stopOnSignals } from "./http-helpers.ts";
import { handlePaymentsRequest } from "./payments-http.ts";
import { createPaymentsState, type PaymentsContext, type PaymentsState } from "./payments-state.ts";
import { createWebhookSender } from "./webhook-delivery.ts";

export const DEFAULT_WEBHOOK_SECRET = "whsec_local_fake_secret";

export type PaymentsFakeOptions = {
  port: number;
  /** Where events are POSTed, e.g. http://127.0.0.1:3000/api/v1/payments/webhook. Events are
   * only recorded when omitted. */
  webhookUrl?: string;
  webhookSecret?: string;
  /** Waits before each retry of a failed delivery; default 1 s, 3 s, 9 s (4 attempts). */
  retryDelaysMs?: number[];
  log?: (line: string) => void;
};

export type PaymentsFake = {
  /** e.g. http://127.0.0.1:12111 */
  url: string;
  port: number;
  state: PaymentsState;
  close(): Promise<void>;
};

export async function startPaymentsFake(options: PaymentsFakeOptions): Promise<PaymentsFake> {
  const log = options.log ?? ((line: string) => console.log(line));
  const state = createPaymentsState();
  const webhooks = createWebhookSender({
    url: options.webhookUrl || undefined,
    secret: options.webhookSecret ?? DEFAULT_WEBHOOK_SECRET,
    retryDelaysMs: options.retryDelaysMs ?? [1000, 3000, 9000],
    // Through ctx.state, so a /_fake/reset (which swaps the arrays) keeps recording.
    record: (delivery) => ctx.state.deliveries.push(delivery),
    log,
  });
  const ctx: PaymentsContext = { state, webhooks, baseUrl: "", log };
  const server = createServer((req, res) => {
    handlePaymentsRequest(ctx, req, res).catch((error: unknown) => {
      log(`payments fake: request failed: ${String(error)}`);
      if (!res.headersSent) res.writeHead(500);
      res.end();
    });
  });
  const port = await listen(server, options.port);
  ctx.baseUrl = `http://${LOOPBACK}:${port}`;

  return {
    url: ctx.baseUrl,
    port,
    state,
    async close() {
      webhooks.close();
      await closeHttpServer(server);
    },
  };
}

async function main(): Promise<void> {
  const webhookUrl = process.env.WEBHOOK_URL || undefined;
  const fake = await startPaymentsFake({
    port: Number(process.env.PAYMENTS_PORT ?? 12111),
    webhookUrl,
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET || DEFAULT_WEBHOOK_SECRET,
  });
  console.log(`payments fake: Stripe API at ${fake.url}, webhooks → ${webhookUrl ?? "(none: set WEBHOOK_URL)"}`);
  stopOnSignals("payments fake", () => fake.close());
}

if (isMainModule(import.meta.url)) {
  main().catch((error: unknown) => {
    console.error("payments fake: failed to start:", error);
    process.exit(1);
  });
}
