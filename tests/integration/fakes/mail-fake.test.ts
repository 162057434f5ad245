import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import nodemailer, { type SendMailOptions } from "nodemailer";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "../../../fakes/mail-server.ts";

type Message = { id: string; from: string; to: string[]; subject: string; text: string; html: string };

let fake: MailFake;

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0, log: () => {} });
});
afterAll(async () => {
  await fake?.close();
});
beforeEach(async () => {
  await fetch(`${fake.url}/messages`, { method: "DELETE" });
});

function send(smtpPort: number, mail: SendMailOptions) {
  const transport = nodemailer.createTransport({ host: "127.0.0.1", port: smtpPort, secure: false, ignoreTLS: true });
  return transport.sendMail({ from: "Kitwright <no-reply@kitwright.test>", ...mail });
}

async function messages(baseUrl: string, query = ""): Promise<Message[]> {
  const response = await fetch(`${baseUrl}/messages${query}`);
  expect(response.status).toBe(200);
  return ((await response.json()) as { messages: Message[] }).messages;
}

describe("mail fake", () => {
  it("stores a sent message with its html and text for the outbox", async () => {
    await send(fake.smtpPort, {
      to: "Ana Installer <ana@example.test>",
      subject: "Your quote Q-104 is ready",
      text: "Open your quote: http://localhost/q/104",
      html: '<p>Open <a href="http://localhost/q/104">your quote</a></p>',
    });

    const [message] = await messages(fake.url);
    expect(message).toMatchObject({
      from: "Kitwright <no-reply@kitwright.test>",
      to: ["ana@example.test"],
      subject: "Your quote Q-104 is ready",
    });
    expect(message!.html).toContain('<a href="http://localhost/q/104">your quote</a>');
    expect(message!.text).toContain("Open your quote");

    const one = await fetch(`${fake.url}/messages/${message!.id}`);
    expect(((await one.json()) as Message).subject).toBe("Your quote Q-104 is ready");
  });

  it("lists newest first and filters by recipient, ignoring case", async () => {
    await send(fake.smtpPort, { to: "ana@example.test", subject: "first", text: "1" });
    await send(fake.smtpPort, { to: "bo@example.test", subject: "second", text: "2" });
    await send(fake.smtpPort, { to: "ana@example.test", bcc: "audit@example.test", subject: "third", text: "3" });

    expect((await messages(fake.url)).map((m) => m.subject)).toEqual(["third", "second", "first"]);
    const forAna = await messages(fake.url, "?to=ANA@Example.test");
    expect(forAna.map((m) => m.subject)).toEqual(["third", "first"]);
    // Bcc never appears in headers; the SMTP envelope still knows it.
    expect((await messages(fake.url, "?to=audit@example.test")).map((m) => m.subject)).toEqual(["third"]);
  });

  it("clears all messages on DELETE and answers 404 for an unknown id", async () => {
    await send(fake.smtpPort, { to: "ana@example.test", subject: "gone soon", text: "x" });
    expect(await messages(fake.url)).toHaveLength(1);

    const cleared = await fetch(`${fake.url}/messages`, { method: "DELETE" });
    expect(cleared.status).toBe(200);
    expect(await messages(fake.url)).toHaveLength(0);
    expect((await fetch(`${fake.url}/messages/nope`)).status).toBe(404);
    expect((await fetch(`${fake.url}/healthz`)).status).toBe(200);
  });

  it("keeps messages across a restart when given a store file", async () => {
    const dir = mkdtempSync(join(tmpdir(), "mail-fake-"));
    const storeFile = join(dir, "mail.json");
    try {
      const first = await startMailFake({ smtpPort: 0, httpPort: 0, storeFile, log: () => {} });
      await send(first.smtpPort, { to: "ana@example.test", subject: "survives", text: "x" });
      await first.close();

      const second = await startMailFake({ smtpPort: 0, httpPort: 0, storeFile, log: () => {} });
      try {
        expect((await messages(second.url)).map((m) => m.subject)).toEqual(["survives"]);
      } finally {
        await second.close();
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
