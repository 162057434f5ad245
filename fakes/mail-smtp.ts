// SMTP side of the mail fake: accepts anything on loopback, parses it and hands it to the store.
import { randomUUID } from "node:crypto";
import { simpleParser, type AddressObject, type ParsedMail } from "mailparser";
import { SMTPServer, type SMTPServerSession } from "smtp-server";
import type { MailStore, StoredMail } from "./mail-store.ts";

export function createSmtpServer(store: MailStore, log: (line: string) => void): SMTPServer {
  return new SMTPServer({
    // Loopback only and plain text: the app's client uses `ignoreTLS: true`.
    disabledCommands: ["STARTTLS"],
    authOptional: true,
    // If the app is configured with SMTP credentials, accept whatever it sends.
    allowInsecureAuth: true,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? "anonymous" });
    },
    size: 20 * 1024 * 1024,
    logger: false,
    // Do not let a lingering client connection hold up shutdown for the default 30 s.
    closeTimeout: 1000,
    banner: "Kitwright local mail fake",
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail = toStoredMail(parsed, session);
          store.add(mail);
          log(`mail fake: received "${mail.subject}" for ${mail.envelopeTo.join(", ")}`);
          callback();
        })
        .catch((error: Error) => {
          log(`mail fake: could not parse a message: ${error.message}`);
          callback(error);
        });
    },
  });
}

function toStoredMail(parsed: ParsedMail, session: SMTPServerSession): StoredMail {
  const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
  const headerTo = addressesOf(parsed.to);
  const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
  return {
    id: randomUUID(),
    receivedAt: new Date().toISOString(),
    from: formatFrom(parsed.from) ?? envelopeFrom,
    // Fall back to the envelope so a Bcc-only message still shows who it went to.
    to: headerTo.length > 0 ? headerTo : envelopeTo,
    cc: addressesOf(parsed.cc),
    envelopeTo,
    subject: parsed.subject ?? "",
    text: parsed.text ?? "",
    html: parsed.html || "",
  };
}

// "Kitwright <no-reply@…>", without the quotes mailparser's `text` adds around names.
function formatFrom(field: AddressObject | undefined): string | undefined {
  const first = field?.value[0];
  if (!first?.address) return field?.text || undefined;
  return first.name ? `${first.name} <${first.address}>` : first.address;
}

function addressesOf(field: AddressObject | AddressObject[] | undefined): string[] {
  if (!field) return [];
  const objects = Array.isArray(field) ? field : [field];
  return objects.flatMap((o) => o.value.flatMap(flattenAddress));
}

// Address groups ("Team: a@x, b@x;") nest their members one level down.
function flattenAddress(entry: AddressObject["value"][number]): string[] {
  if (entry.group) return entry.group.flatMap(flattenAddress);
  return entry.address ? [entry.address] : [];
}
