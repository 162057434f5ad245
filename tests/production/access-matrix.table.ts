// The access table: for every route of app/routes.ts, what each kind of visitor gets. This is the
// spec; tests/production/access-matrix.test.ts fails when a route has no row here. Ids are team A's
// (Tallowmere Power Works); "otherTeam" is the owner of team B, so every id in a URL is a guess for
// them. POST bodies are empty or incomplete: an allowed visitor gets the validation answer (400),
// so no row writes anything.
import { api, apiTeam, everyone, ownerOnly, quoteCustomerOnly, readingViewers, roleOnly, signedIn, teamOnly, type PerActor } from "./helpers/access-check";
import type { World } from "./helpers/access-world";

export type Body = { form: Record<string, string> } | { json: unknown };

export interface AccessCase {
  pattern: string;
  url: string;
  get: PerActor;
  post?: { body: Body; expect: PerActor; spendsSession?: boolean };
  /** Words that anyone holding this URL may read (it is itself the credential). */
  mayShow?: string[];
}

const EMPTY_FORM: Body = { form: {} };
const EMPTY_JSON: Body = { json: {} };
const BOGUS_UUID = "00000000-0000-4000-8000-000000000000";

export function accessTable(w: World): AccessCase[] {
  const { ids } = w;
  const myQuote = `/my-quotes/${ids.sentQuote}`;
  const curator = (outcome: number) => roleOnly(["curator"], outcome);
  // Customers see nothing but the quotes sent to them: not the catalogue, not the planner's API.
  const staff = (outcome: number) => signedIn(outcome, { customer: 403, quoteCustomer: 403 });
  const apiStaff = (outcome: number) => api(outcome, { customer: 403, quoteCustomer: 403 });
  return [
    { pattern: "/", url: "/", get: everyone(200) },
    { pattern: "/sign-in", url: "/sign-in", get: signedIn("→/", { anonymous: 200 }), post: { body: EMPTY_FORM, expect: signedIn("→/", { anonymous: 400 }) } },
    // (A page POST runs the loaders after the action: signed in, the sign-in and sign-up loaders send you home.)
    { pattern: "/sign-up", url: "/sign-up", get: signedIn("→/", { anonymous: 200 }), post: { body: EMPTY_FORM, expect: signedIn("→/", { anonymous: 400 }) } },
    // Signing out with no session is not an error; each signed-in visitor spends a spare session here.
    { pattern: "/sign-out", url: "/sign-out", get: everyone("→/"), post: { body: EMPTY_FORM, expect: everyone("→/"), spendsSession: true } },
    { pattern: "/forgot-password", url: "/forgot-password", get: everyone(200), post: { body: EMPTY_FORM, expect: everyone(400) } },
    { pattern: "/reset-password", url: "/reset-password", get: everyone(200), post: { body: EMPTY_FORM, expect: everyone(400) } },
    // An invitation that does not exist is not found for anyone; accepting one needs an installer.
    {
      pattern: "/invitations/:invitationId",
      url: "/invitations/no-such-invitation",
      get: everyone(404),
      post: { body: EMPTY_FORM, expect: roleOnly(["noTeam", "otherTeam", "member", "owner"], 404) },
    },
    {
      pattern: "/team/new",
      url: "/team/new",
      get: { ...teamOnly("→/team"), noTeam: 200 },
      post: { body: EMPTY_FORM, expect: { ...teamOnly("→/team"), noTeam: 400 } },
    },
    { pattern: "/team", url: "/team", get: teamOnly(200), post: { body: EMPTY_FORM, expect: ownerOnly(400) } },
    { pattern: "/team/api-keys", url: "/team/api-keys", get: ownerOnly(200), post: { body: EMPTY_FORM, expect: ownerOnly(400) } },
    { pattern: "/admin/users", url: "/admin/users", get: roleOnly(["admin"], 200), post: { body: EMPTY_FORM, expect: roleOnly(["admin"], 400) } },
    { pattern: "/yield", url: "/yield", get: roleOnly(["noTeam", "otherTeam", "member", "owner", "curator", "admin"], 200) },

    // — catalogue: shared by every installer team, curators and admins; only curators change it —
    { pattern: "/catalogue", url: "/catalogue?kind=batteries", get: staff(200) },
    { pattern: "/catalogue/import", url: "/catalogue/import", get: curator(200), post: { body: EMPTY_FORM, expect: curator(400) } },
    { pattern: "/catalogue/:kind/new", url: "/catalogue/batteries/new", get: curator(200), post: { body: EMPTY_FORM, expect: curator(400) } },
    { pattern: "/catalogue/:kind/new", url: "/catalogue/gizmos/new", get: curator(404), post: { body: EMPTY_FORM, expect: curator(404) } },
    {
      pattern: "/catalogue/:kind/:partId/edit",
      url: `/catalogue/modules/${ids.moduleWithReadings}/edit`,
      get: curator(200),
      post: { body: EMPTY_FORM, expect: curator(400) },
    },
    { pattern: "/catalogue/:kind/:partId/edit", url: `/catalogue/modules/${BOGUS_UUID}/edit`, get: curator(404) },
    { pattern: "/catalogue/modules/:moduleId", url: `/catalogue/modules/${ids.moduleWithReadings}`, get: staff(200) },
    { pattern: "/catalogue/modules/:moduleId", url: "/catalogue/modules/not-a-module", get: staff(404) },
    {
      pattern: "/catalogue/modules/:moduleId/merge",
      url: `/catalogue/modules/${ids.moduleWithReadings}/merge`,
      get: curator(200),
      post: { body: EMPTY_FORM, expect: curator(400) },
    },

    // — field readings: the submitting team, curators (who decide) and admins —
    { pattern: "/readings", url: "/readings", get: teamOnly(200) },
    { pattern: "/readings/new", url: "/readings/new", get: teamOnly(200), post: { body: EMPTY_FORM, expect: teamOnly(400) } },
    { pattern: "/readings/:readingId", url: `/readings/${ids.readingA}`, get: readingViewers(200, 404), post: { body: EMPTY_FORM, expect: curator(400) } },
    { pattern: "/readings/:readingId", url: `/readings/${ids.readingB}`, get: readingViewers(404, 200) },
    { pattern: "/readings/:readingId", url: `/readings/${BOGUS_UUID}`, get: readingViewers(404, 404, 404) },
    { pattern: "/review", url: "/review", get: curator(200), post: { body: EMPTY_FORM, expect: curator(400) } },
    { pattern: "/files/:fileId", url: `/files/${ids.photoA}`, get: readingViewers(200, 404) },
    { pattern: "/files/:fileId", url: `/files/${ids.photoB}`, get: readingViewers(404, 200) },

    // — sites, load sheets, plans: team A's ids are guesses for team B —
    { pattern: "/sites", url: "/sites", get: teamOnly(200) },
    { pattern: "/sites/new", url: "/sites/new", get: teamOnly(200), post: { body: EMPTY_FORM, expect: teamOnly(400) } },
    { pattern: "/sites/:siteId", url: `/sites/${ids.site}`, get: teamOnly(200, 404), post: { body: EMPTY_FORM, expect: teamOnly(400, 404) } },
    { pattern: "/sites/:siteId", url: `/sites/${ids.teamBSite}`, get: teamOnly(404, 200) },
    {
      pattern: "/sites/:siteId/loads/new",
      url: `/sites/${ids.site}/loads/new`,
      get: teamOnly(200, 404),
      post: { body: EMPTY_FORM, expect: teamOnly(400, 404) },
    },
    {
      pattern: "/sites/:siteId/loads/:loadSheetId",
      url: `/sites/${ids.site}/loads/${ids.sheet}`,
      get: teamOnly(200, 404),
      post: { body: EMPTY_FORM, expect: teamOnly(400, 404) },
    },
    { pattern: "/plans", url: "/plans", get: teamOnly(200) },
    { pattern: "/plans/new", url: "/plans/new", get: teamOnly(200), post: { body: EMPTY_FORM, expect: teamOnly(400) } },
    { pattern: "/plans/new", url: `/plans/new?siteId=${ids.site}`, get: teamOnly(200, 404) },
    { pattern: "/plans/:planId", url: `/plans/${ids.plan}`, get: teamOnly(200, 404), post: { body: EMPTY_FORM, expect: teamOnly(400, 404) } },
    { pattern: "/plans/:planId", url: `/plans/${ids.plan}?revision=1`, get: teamOnly(200, 404) },
    // The pick is checked before the plan is looked up: an incomplete one is a 400 for any plan id,
    // which tells nothing. (A complete pick on another team's plan is a 404: see the leak tests.)
    {
      pattern: "/plans/:planId/alternatives",
      url: `/plans/${ids.plan}/alternatives`,
      get: teamOnly(200, 404),
      post: { body: EMPTY_FORM, expect: teamOnly(400) },
    },

    // — sourcing —
    { pattern: "/sourcing", url: "/sourcing", get: teamOnly(200) },
    { pattern: "/sourcing/suppliers/new", url: "/sourcing/suppliers/new", get: teamOnly(200), post: { body: EMPTY_FORM, expect: teamOnly(400) } },
    {
      pattern: "/sourcing/suppliers/:supplierId",
      url: `/sourcing/suppliers/${ids.supplier}`,
      get: teamOnly(200, 404),
      post: { body: EMPTY_FORM, expect: teamOnly(400, 404) },
    },
    {
      pattern: "/sourcing/offers/new",
      url: `/sourcing/offers/new?supplierId=${ids.supplier}`,
      get: teamOnly(200),
      post: { body: EMPTY_FORM, expect: teamOnly(400) },
    },
    {
      pattern: "/sourcing/offers/:offerId",
      url: `/sourcing/offers/${ids.offer}`,
      get: teamOnly(200, 404),
      post: { body: EMPTY_FORM, expect: teamOnly(400, 404) },
    },
    { pattern: "/sourcing/import", url: "/sourcing/import", get: teamOnly(200), post: { body: EMPTY_FORM, expect: teamOnly(400) } },
    { pattern: "/sourcing/export", url: "/sourcing/export", get: teamOnly(200) },
    { pattern: "/sourcing/rates", url: "/sourcing/rates", get: teamOnly(200), post: { body: EMPTY_FORM, expect: teamOnly(400) } },
    { pattern: "/sourcing/compare/:kind", url: "/sourcing/compare/modules", get: teamOnly(200) },
    { pattern: "/sourcing/compare/:kind", url: "/sourcing/compare/gizmos", get: teamOnly(404) },
    // Comparing for a plan fills the fields from it once (a redirect); another team's plan is not found.
    {
      pattern: "/sourcing/compare/:kind",
      url: `/sourcing/compare/batteries?plan=${ids.plan}`,
      get: teamOnly(`→/sourcing/compare/batteries?plan=${ids.plan}&*`, 404),
    },

    // — quotes: the team's side, and the customer's —
    { pattern: "/quotes", url: "/quotes", get: teamOnly(200), post: { body: EMPTY_FORM, expect: teamOnly(400) } },
    // "save" with no fields is refused before the quote is looked up (400 for any id, telling nothing).
    {
      pattern: "/quotes/:quoteId",
      url: `/quotes/${ids.sentQuote}`,
      get: teamOnly(200, 404),
      post: { body: { form: { intent: "save" } }, expect: teamOnly(400) },
    },
    { pattern: "/quotes/:quoteId", url: `/quotes/${ids.draftQuote}?revision=1`, get: teamOnly(200, 404) },
    { pattern: "/quotes/:quoteId/print", url: `/quotes/${ids.sentQuote}/print`, get: teamOnly(200, 404) },
    { pattern: "/quotes/:quoteId/print", url: `/quotes/${ids.draftQuote}/print`, get: teamOnly(200, 404) },
    // The e-mailed link: a stale or made-up token says so; it never shows the quote by itself.
    {
      pattern: "/quote-access/:token",
      url: "/quote-access/not-a-real-token-0123456789",
      get: everyone(200),
      post: { body: EMPTY_FORM, expect: everyone(404) },
    },
    // The real link: its customer goes to the quote (signing in first); another account is told whom
    // it was sent to, which the link's holder may read. Setting a password again is refused (400).
    {
      pattern: "/quote-access/:token",
      url: `/quote-access/${w.quoteToken}`,
      get: signedIn(200, { anonymous: `→/sign-in?redirectTo=${encodeURIComponent(myQuote)}`, quoteCustomer: `→${myQuote}` }),
      post: { body: EMPTY_FORM, expect: { ...everyone(400), anonymous: `→/sign-in?redirectTo=${encodeURIComponent(myQuote)}`, quoteCustomer: `→${myQuote}` } },
      mayShow: [w.emails.quoteCustomer],
    },
    { pattern: "/my-quotes", url: "/my-quotes", get: signedIn(200) },
    // Paying needs an approved quote (409 for its customer); anyone else is told it does not exist.
    { pattern: "/my-quotes/:quoteId", url: myQuote, get: quoteCustomerOnly(200), post: { body: { form: { intent: "pay" } }, expect: quoteCustomerOnly(409) } },
    { pattern: "/my-quotes/:quoteId", url: `/my-quotes/${ids.draftQuote}`, get: quoteCustomerOnly(404) },
    { pattern: "/my-quotes/:quoteId/print", url: `${myQuote}/print`, get: quoteCustomerOnly(200) },
    { pattern: "/my-quotes/:quoteId/print", url: `/my-quotes/${ids.draftQuote}/print`, get: quoteCustomerOnly(404) },

    // — operations —
    { pattern: "/dev/outbox", url: "/dev/outbox", get: everyone(404) },
    { pattern: "/healthz", url: "/healthz", get: everyone(200) },
    { pattern: "/readyz", url: "/readyz", get: everyone(200) },

    // — API —
    { pattern: "/api/auth/*", url: "/api/auth/get-session", get: everyone(200) },
    { pattern: "/api/auth/*", url: "/api/auth/sign-in/email", get: everyone(404), post: { body: EMPTY_JSON, expect: everyone(400) } },
    { pattern: "/api/v1/me", url: "/api/v1/me", get: api(200) },
    { pattern: "/api/v1/yield", url: "/api/v1/yield", get: everyone(405), post: { body: EMPTY_JSON, expect: apiStaff(400) } },
    { pattern: "/api/v1/modules", url: "/api/v1/modules", get: apiStaff(200) },
    { pattern: "/api/v1/readings", url: "/api/v1/readings", get: api(200, { customer: 403, quoteCustomer: 403, noTeam: 403 }) },
    { pattern: "/api/v1/readings/preview", url: "/api/v1/readings/preview", get: everyone(405), post: { body: EMPTY_JSON, expect: apiStaff(400) } },
    { pattern: "/api/v1/modules/:moduleId", url: `/api/v1/modules/${ids.moduleWithReadings}`, get: apiStaff(200) },
    { pattern: "/api/v1/modules/:moduleId", url: `/api/v1/modules/${BOGUS_UUID}`, get: apiStaff(404) },
    { pattern: "/api/v1/sites", url: "/api/v1/sites", get: apiTeam(200), post: { body: EMPTY_JSON, expect: apiTeam(400) } },
    { pattern: "/api/v1/sites/:siteId", url: `/api/v1/sites/${ids.site}`, get: apiTeam(200, 404) },
    { pattern: "/api/v1/plans", url: "/api/v1/plans", get: apiTeam(200), post: { body: EMPTY_JSON, expect: apiTeam(400) } },
    { pattern: "/api/v1/plans/preview", url: "/api/v1/plans/preview", get: everyone(405), post: { body: EMPTY_JSON, expect: apiTeam(400) } },
    { pattern: "/api/v1/plans/:planId", url: `/api/v1/plans/${ids.plan}`, get: apiTeam(200, 404) },
    {
      pattern: "/api/v1/plans/:planId/alternatives",
      url: `/api/v1/plans/${ids.plan}/alternatives`,
      get: everyone(405),
      post: { body: EMPTY_JSON, expect: apiTeam(200, 404) },
    },
    { pattern: "/api/v1/offers", url: "/api/v1/offers", get: apiTeam(200) },
    { pattern: "/api/v1/offers/import", url: "/api/v1/offers/import", get: everyone(405), post: { body: EMPTY_JSON, expect: apiTeam(400) } },
    { pattern: "/api/v1/offers/:offerId", url: `/api/v1/offers/${ids.offer}`, get: apiTeam(200, 404) },
    { pattern: "/api/v1/quotes", url: "/api/v1/quotes", get: apiTeam(200) },
    { pattern: "/api/v1/quotes/:quoteId", url: `/api/v1/quotes/${ids.sentQuote}`, get: apiTeam(200, 404) },
    { pattern: "/api/v1/quotes/:quoteId", url: `/api/v1/quotes/${ids.draftQuote}?revision=1`, get: apiTeam(200, 404) },
    // The signature is the credential: no session matters, an unsigned event is refused.
    { pattern: "/api/v1/payments/webhook", url: "/api/v1/payments/webhook", get: everyone(405), post: { body: EMPTY_JSON, expect: everyone(400) } },
    { pattern: "/api/v1/*", url: "/api/v1/no-such-endpoint", get: everyone(404), post: { body: EMPTY_JSON, expect: everyone(404) } },
    { pattern: "/*", url: "/no-such-page", get: everyone(404) },
  ];
}
