// A signed-in page: the demo team's owner signs in through better-auth's JSON endpoint (a POST, so it
// carries Origin = PUBLIC_URL like a browser's), and GET /quotes is loaded with that session cookie:
// the root loader, the session and team guards, two team queries and the server render of the page.
import { BENCH_PORTS } from "./http-stack";
import type { LoadTarget } from "./load";
import { DEMO_PASSWORD, DEMO_USERS } from "../../data/demo/people";

const PAGE_PATH = "/quotes";

async function signInCookie(base: string, publicUrl: string) {
  const owner = DEMO_USERS.find((u) => u.team?.membership === "owner")!;
  const response = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "Content-Type": "application/json", Origin: new URL(publicUrl).origin },
    body: JSON.stringify({ email: owner.email, password: DEMO_PASSWORD }),
  });
  if (response.status !== 200) throw new Error(`signing in as ${owner.email} answered ${response.status}: ${await response.text()}`);
  const cookie = response.headers
    .getSetCookie()
    .map((line) => line.split(";")[0])
    .join("; ");
  if (!cookie) throw new Error("signing in set no session cookie");
  return { cookie, email: owner.email };
}

/** GET /quotes as the signed-in owner, checked once (200 with the page, not a redirect to sign-in). */
export async function signedInPageTarget(publicUrl: string): Promise<LoadTarget> {
  const base = `http://127.0.0.1:${BENCH_PORTS.app}`;
  const { cookie, email } = await signInCookie(base, publicUrl);
  const url = `${base}${PAGE_PATH}`;
  const check = await fetch(url, { headers: { Cookie: cookie }, redirect: "manual" });
  const html = await check.text();
  if (check.status !== 200 || !html.includes("<title>Quotes")) throw new Error(`GET ${PAGE_PATH} signed in answered ${check.status} (${html.slice(0, 120)})`);
  return { name: `GET ${PAGE_PATH} (page, signed in as ${email.split("@")[0]})`, server: "app", url, headers: { Cookie: cookie } };
}
