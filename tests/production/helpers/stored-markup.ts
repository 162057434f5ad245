// Markup saved through valid forms (site, customer, supplier, load sheet and appliance, field reading
// notes, team, quote title and line), then the pages that show it, each with the values it must show.
// React escapes text; the check is that it still does on every one of these pages.
import { demoModulePhoto } from "../../../scripts/lib/demo-photo";
import { postMultipart, withField, type Actor } from "./hostile-corpus";
import { readingFields } from "./hostile-corpus-readings";
import { siteFormFields, validSheet } from "./hostile-corpus-planning";
import { supplierFields } from "./hostile-corpus-sourcing";
import { send, type RawAnswer } from "./hostile-http";
import type { HostileWorld } from "./hostile-setup";
import { XSS_ATTRIBUTE, XSS_SCRIPT } from "./hostile-values";
import { PUBLIC_URL } from "./throwaway-stack";

export const ESCAPED = {
  [XSS_SCRIPT]: "&lt;script&gt;alert(1)&lt;/script&gt;",
  [XSS_ATTRIBUTE]: "&lt;img src=x onerror=alert(1)&gt;",
};

export interface MarkupPage {
  actor: Actor;
  path: string;
  shows: (typeof XSS_SCRIPT | typeof XSS_ATTRIBUTE)[];
}

function location(answer: RawAnswer, what: string) {
  if (answer.status !== 302) throw new Error(`${what}: expected a redirect, got ${answer.status}: ${answer.body.slice(0, 300)}`);
  return String(answer.headers.location);
}

/** Saves markup through the real forms and lists the pages that must show it escaped. */
export async function saveMarkup(world: HostileWorld): Promise<MarkupPage[]> {
  const { postForm, cookies, ids } = world;
  const installer = cookies.installer;
  const site = location(await postForm("/sites/new", withField(siteFormFields(XSS_SCRIPT), "customerName", XSS_ATTRIBUTE), installer), "site");
  const supplier = location(await postForm("/sourcing/suppliers/new", withField(supplierFields(XSS_SCRIPT), "contact", XSS_ATTRIBUTE), installer), "supplier");
  const sheet = { ...validSheet(XSS_SCRIPT), name: XSS_ATTRIBUTE };
  location(await postForm(`/sites/${ids.siteId}/loads/new`, [["sheet", JSON.stringify(sheet)]], installer), "load sheet");
  const { rows } = await world.database.client.query<{ id: string }>("select id from load_sheet where name = $1", [XSS_ATTRIBUTE]);
  const reading = postMultipart(
    "",
    "installer",
    "/readings/new",
    "",
    readingFields(ids.moduleId, XSS_ATTRIBUTE, `${XSS_SCRIPT} measured at noon with the module clean.`),
    [{ name: "photo", filename: "module.png", type: "image/png", bytes: demoModulePhoto(3, 60, 40) }],
  );
  const readingPath = location(
    await send(world.port, {
      method: "POST",
      path: reading.path,
      body: reading.body,
      headers: { "Content-Type": reading.contentType!, Origin: PUBLIC_URL, Cookie: installer },
    }),
    "field reading",
  );
  location(await postForm("/team/new", [["name", XSS_SCRIPT]], cookies.loner), "team");
  const quote = `/quotes/${ids.sentQuoteId}`;
  const mine = `/my-quotes/${ids.sentQuoteId}`;
  const both = [XSS_SCRIPT, XSS_ATTRIBUTE] as MarkupPage["shows"];
  return [
    { actor: "installer", path: "/sites", shows: [XSS_SCRIPT] },
    { actor: "installer", path: site, shows: both },
    { actor: "installer", path: `/sites/${ids.siteId}`, shows: [XSS_ATTRIBUTE] },
    { actor: "installer", path: `/sites/${ids.siteId}/loads/${rows[0].id}`, shows: both },
    { actor: "installer", path: "/sourcing", shows: [XSS_SCRIPT] },
    { actor: "installer", path: supplier, shows: both },
    { actor: "installer", path: readingPath, shows: both },
    { actor: "curator", path: readingPath, shows: both },
    { actor: "installer", path: "/quotes", shows: [XSS_SCRIPT] },
    { actor: "installer", path: quote, shows: both },
    { actor: "installer", path: `${quote}/print`, shows: both },
    { actor: "customer", path: "/my-quotes", shows: [XSS_SCRIPT] },
    { actor: "customer", path: mine, shows: both },
    { actor: "customer", path: `${mine}/print`, shows: both },
    { actor: "loner", path: "/team", shows: [XSS_SCRIPT] },
  ];
}

/** What is wrong with a page that should show the saved markup escaped. */
export function markupProblems(page: MarkupPage, answer: RawAnswer): string[] {
  const problems: string[] = [];
  if (answer.status !== 200) return [`${page.actor} ${page.path}: answered ${answer.status}`];
  for (const raw of [XSS_SCRIPT, "<img src=x onerror=alert(1)>"]) if (answer.body.includes(raw)) problems.push(`${page.actor} ${page.path}: raw ${raw}`);
  for (const value of page.shows) if (!answer.body.includes(ESCAPED[value])) problems.push(`${page.actor} ${page.path}: does not show ${ESCAPED[value]}`);
  return problems;
}
