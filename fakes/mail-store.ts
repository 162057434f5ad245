// In-memory store of received mail, optionally mirrored to a JSON file so a restart of the
// fake during development does not lose the outbox.
import { existsSync, readFileSync, renameSync, writeFileSync } from "node:fs";

export type StoredMail = {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  cc: string[];
  /** SMTP RCPT TO addresses: includes Bcc recipients, which never appear in headers. */
  envelopeTo: string[];
  subject: string;
  /** "" when the message has no such part, so readers can treat both as plain strings. */
  text: string;
  html: string;
};

export type MailStore = {
  add(mail: StoredMail): void;
  list(filter?: { to?: string }): StoredMail[];
  get(id: string): StoredMail | undefined;
  clear(): void;
};

// A long dev session should not grow memory without bound; the outbox only needs recent mail.
const DEFAULT_LIMIT = 1000;

export function createMailStore(options: { file?: string; limit?: number } = {}): MailStore {
  const limit = options.limit ?? DEFAULT_LIMIT;
  // Oldest first internally; list() reverses.
  let messages: StoredMail[] = options.file ? loadFile(options.file) : [];

  function persist(): void {
    if (!options.file) return;
    const tmp = `${options.file}.tmp`;
    // Write then rename so a crash mid-write never leaves a half file to load next time.
    writeFileSync(tmp, JSON.stringify(messages, null, 2));
    renameSync(tmp, options.file);
  }

  return {
    add(mail) {
      messages.push(mail);
      if (messages.length > limit) messages = messages.slice(-limit);
      persist();
    },
    list(filter = {}) {
      const to = filter.to?.trim().toLowerCase();
      const matching = to ? messages.filter((m) => recipientsOf(m).includes(to)) : messages;
      return [...matching].reverse();
    },
    get(id) {
      return messages.find((m) => m.id === id);
    },
    clear() {
      messages = [];
      persist();
    },
  };
}

function recipientsOf(mail: StoredMail): string[] {
  return [...mail.to, ...mail.cc, ...mail.envelopeTo].map((a) => a.toLowerCase());
}

function loadFile(file: string): StoredMail[] {
  if (!existsSync(file)) return [];
  try {
    const parsed: unknown = JSON.parse(readFileSync(file, "utf8"));
    return Array.isArray(parsed) ? (parsed as StoredMail[]) : [];
  } catch (error) {
    console.warn(`mail fake: ignoring unreadable store file ${file}:`, (error as Error).message);
    return [];
  }
}
