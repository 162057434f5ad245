// One-shot messages after a redirect (post/redirect/get), read by the root loader.
import { createCookieSessionStorage, redirect } from "react-router";
import { env } from "./env.server";

import type { Flash } from "~/lib/flash";
export type { Flash };

const storage = createCookieSessionStorage<{}, { flash: Flash }>({
  cookie: {
    name: "kw_flash",
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    secure: env.PUBLIC_URL.startsWith("https://"),
    secrets: [env.BETTER_AUTH_SECRET],
  },
});

export async function readFlash(request: Request) {
  const session = await storage.getSession(request.headers.get("Cookie"));
  const flash = session.get("flash") ?? null;
  const headers = flash ? { "Set-Cookie": await storage.commitSession(session) } : undefined;
  return { flash, headers };
}

/** Redirects with a flash message; extra headers (e.g. a session cookie) are kept. */
export async function redirectWithFlash(url: string, flash: Flash, init: { headers?: Headers } = {}) {
  const session = await storage.getSession();
  session.flash("flash", flash);
  const headers = new Headers(init.headers);
  headers.append("Set-Cookie", await storage.commitSession(session));
  return redirect(url, { headers });
}
