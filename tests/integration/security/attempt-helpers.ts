// Sign-in and reset requests as they reach the app from a given client address (the production
// server writes it into CLIENT_IP_HEADER; here the tests choose it).
import { BASE, isDataWithInit, toResult } from "../helpers/route-client";
import { CLIENT_IP_HEADER } from "~/server/client-ip.server";

type Action = (args: any) => unknown;

export async function callAction(action: Action, request: Request) {
  try {
    return await toResult(await action({ request, params: {}, context: {}, url: new URL(request.url), pattern: "" }));
  } catch (thrown) {
    if (thrown instanceof Response || isDataWithInit(thrown)) return toResult(thrown);
    throw thrown;
  }
}

function headersFrom(ip: string | null, extra: Record<string, string> = {}) {
  const headers = new Headers({ Origin: BASE, ...extra });
  if (ip) headers.set(CLIENT_IP_HEADER, ip);
  return headers;
}

export function formPost(path: string, form: Record<string, string>, ip: string | null = null) {
  return new Request(new URL(path, BASE), { method: "POST", headers: headersFrom(ip), body: new URLSearchParams(form) });
}

export function jsonPost(path: string, body: unknown, ip: string | null = null) {
  return new Request(new URL(path, BASE), {
    method: "POST",
    headers: headersFrom(ip, { "Content-Type": "application/json" }),
    body: JSON.stringify(body),
  });
}

export function pageError(result: { data: any }): string {
  return (result.data?.result?.error?.[""] ?? []).join(" ");
}
