// A loopback SMTP server that accepts every message and keeps its text, so that the production
// server can send quotes and review e-mails during a test without the full mail fake.
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { freePort } from "./throwaway-stack";

export interface SunkMail {
  to: string[];
  subject: string;
  text: string;
}

export async function startMailSink() {
  const mails: SunkMail[] = [];
  const server = new SMTPServer({
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    logger: false,
    closeTimeout: 500,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          mails.push({ to: session.envelope.rcptTo.map((r) => r.address), subject: parsed.subject ?? "", text: parsed.text ?? "" });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  const port = await freePort();
  await new Promise<void>((resolve) => server.listen(port, "127.0.0.1", resolve));
  return { port, mails, stop: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
