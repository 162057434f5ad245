// Local stand-in for the hosted mail provider: an SMTP server the app sends through and an
// HTTP API to read what was "sent". Run: `tsx fakes/mail-server.ts`, or start it in-process.
import { closeHttpServer, isMainModule, listen, LOOPBACK, stopOnSignals } from "./http-helpers.ts";
import { createMailHttpServer } from "./mail-http.ts";
import { createSmtpServer } from "./mail-smtp.ts";
import { createMailStore, type MailStore } from "./mail-store.ts";

export type MailFakeOptions = {
  smtpPort: number;
  httpPort: number;
  /** JSON file that keeps messages across restarts; memory only when omitted. */
  storeFile?: string;
  log?: (line: string) => void;
};

export type MailFake = {
  smtpPort: number;
  httpPort: number;
  /** Base URL of the JSON API, e.g. http://127.0.0.1:2580 */
  url: string;
  store: MailStore;
  close(): Promise<void>;
};

export async function startMailFake(options: MailFakeOptions): Promise<MailFake> {
  const log = options.log ?? ((line: string) => console.log(line));
  const store = createMailStore({ file: options.storeFile });
  const smtp = createSmtpServer(store, log);
  const http = createMailHttpServer(store);
  // smtp-server reports socket errors here; without a listener they would crash the process.
  smtp.on("error", (error) => log(`mail fake: SMTP error: ${error.message}`));

  const smtpPort = await listen(smtp.server, options.smtpPort);
  let httpPort: number;
  try {
    httpPort = await listen(http, options.httpPort);
  } catch (error) {
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
    throw error;
  }

  return {
    smtpPort,
    httpPort,
    url: `http://${LOOPBACK}:${httpPort}`,
    store,
    async close() {
      await Promise.all([new Promise<void>((resolve) => smtp.close(() => resolve())), closeHttpServer(http)]);
    },
  };
}

async function main(): Promise<void> {
  const fake = await startMailFake({
    smtpPort: Number(process.env.MAIL_SMTP_PORT ?? 2525),
    httpPort: Number(process.env.MAIL_HTTP_PORT ?? 2580),
    storeFile: process.env.MAIL_STORE_FILE || undefined,
  });
  console.log(`mail fake: SMTP ${LOOPBACK}:${fake.smtpPort}, API ${fake.url}/messages`);
  stopOnSignals("mail fake", () => fake.close());
}

if (isMainModule(import.meta.url)) {
  main().catch((error: unknown) => {
    console.error("mail fake: failed to start:", error);
    process.exit(1);
  });
}
