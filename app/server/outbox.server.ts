// Reads the local mail fake's store (development and tests only).
import { env } from "./env.server";

export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

export async function listOutbox(to?: string): Promise<OutboxMessage[]> {
  const url = new URL("/messages", env.MAIL_FAKE_URL);
  if (to) url.searchParams.set("to", to);
  const res = await fetch(url, { signal: AbortSignal.timeout(3000) });
  if (!res.ok) throw new Error(`mail fake answered ${res.status}`);
  const body = (await res.json()) as OutboxMessage[] | { messages: OutboxMessage[] };
  return Array.isArray(body) ? body : body.messages;
}
