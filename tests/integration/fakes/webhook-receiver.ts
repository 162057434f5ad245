// A stand-in for the app's webhook route: records raw bodies and headers, and answers with
// the status codes a test scripts (e.g. 500 then 200, to exercise retries).
import { createServer } from "node:http";

export type ReceivedWebhook = { rawBody: string; signature: string };

export async function startWebhookReceiver(statuses: number[] = []) {
  const received: ReceivedWebhook[] = [];
  const waiters: Array<() => void> = [];
  const server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (chunk: Buffer) => chunks.push(chunk));
    req.on("end", () => {
      received.push({
        rawBody: Buffer.concat(chunks).toString("utf8"),
        signature: String(req.headers["stripe-signature"] ?? ""),
      });
      res.writeHead(statuses[received.length - 1] ?? 200).end();
      for (const wake of waiters.splice(0)) wake();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as { port: number };

  return {
    url: `http://127.0.0.1:${port}/api/v1/payments/webhook`,
    received,
    /** Resolves once `count` deliveries have arrived (fails the test after 5 s). */
    async waitFor(count: number): Promise<ReceivedWebhook[]> {
      const deadline = Date.now() + 5000;
      while (received.length < count) {
        if (Date.now() > deadline) throw new Error(`expected ${count} webhooks, got ${received.length}`);
        await new Promise<void>((resolve) => {
          waiters.push(resolve);
          setTimeout(resolve, 100);
        });
      }
      return received;
    },
    close(): Promise<void> {
      server.closeAllConnections();
      return new Promise((resolve) => server.close(() => resolve()));
    },
  };
}
