// How the access matrix states and checks an answer: a status, or a redirect (React Router's 302;
// over single fetch a 202 whose turbo-stream body names the target), and never a word that the actor
// may not read.
import { ACTORS, type Actor, type World } from "./access-world";
import type { HttpAnswer } from "./http";

/** A status, "→sign-in" (to /sign-in?redirectTo=<this path>), "→/exact/path" or "→/prefix*". */
export type Outcome = number | `→${string}`;
export type PerActor = Record<Actor, Outcome>;
export const SIGN_IN = "→sign-in" as const;

export function dataUrl(url: string) {
  const parsed = new URL(url, "http://x");
  return `${parsed.pathname === "/" ? "/_root" : parsed.pathname}.data${parsed.search}`;
}

function redirectTarget(outcome: `→${string}`, url: string) {
  const parsed = new URL(url, "http://x");
  return outcome === SIGN_IN ? `/sign-in?redirectTo=${encodeURIComponent(parsed.pathname + parsed.search)}` : outcome.slice(1);
}

/** Null when the answer is as expected, else what differs. `url` is the page URL, even for `.data`. */
export function mismatch(answer: HttpAnswer, outcome: Outcome, url: string, viaData: boolean): string | null {
  if (typeof outcome === "number") {
    return answer.status === outcome ? null : `status ${answer.status}, expected ${outcome} (${oneLine(answer)})`;
  }
  const target = redirectTarget(outcome, url);
  const prefix = target.endsWith("*");
  const wanted = prefix ? target.slice(0, -1) : target;
  if (viaData) {
    const named = answer.body.includes("SingleFetchRedirect") && answer.body.includes(`"redirect","${wanted}${prefix ? "" : '"'}`);
    return answer.status === 202 && named ? null : `status ${answer.status}, expected a single-fetch redirect to ${target} (${oneLine(answer)})`;
  }
  const location = String(answer.headers.location ?? "");
  const sameTarget = prefix ? location.startsWith(wanted) : location === wanted;
  return (answer.status === 302 || answer.status === 303) && sameTarget ? null : `status ${answer.status} → "${location}", expected a redirect to ${target}`;
}

function oneLine(answer: HttpAnswer) {
  return answer.body.replace(/\s+/g, " ").slice(0, 160);
}

/** Words from team A (and B) that this actor must never be shown, in any answer. */
export function forbiddenWords(actor: Actor, world: World): string[] {
  const inTeamA = actor === "member" || actor === "owner";
  const words: string[] = [];
  if (!inTeamA) words.push(...world.canaries.teamAPrivate);
  if (!inTeamA && actor !== "quoteCustomer") words.push(world.canaries.sentQuoteTitle);
  if (actor !== "otherTeam") words.push(world.canaries.teamBSite);
  // Curators see who submitted a reading and which team, admins list every account; team A's quote
  // customer sees team A's name on the quote. Nobody else sees a team's name or its people.
  const seesEveryone = actor === "curator" || actor === "admin";
  if (!inTeamA && !seesEveryone) words.push("Maren Quill", "Tobin Arkwell", "tallowmere.example");
  if (!inTeamA && !seesEveryone && actor !== "quoteCustomer") words.push(world.teamA.name, "Aurel Stroud", "warden@vell-hut.example");
  if (actor !== "otherTeam" && !seesEveryone) words.push(world.teamB.name, "Sefa Lindqvist-Orr", "brindlecombe.example");
  return words;
}

export function leakedWords(answer: HttpAnswer, actor: Actor, world: World) {
  return forbiddenWords(actor, world).filter((word) => answer.body.includes(word));
}

// — the table's vocabulary: who gets what —

export function everyone(outcome: Outcome): PerActor {
  return Object.fromEntries(ACTORS.map((actor) => [actor, outcome])) as PerActor;
}

export function signedIn(outcome: Outcome, overrides: Partial<PerActor> = {}): PerActor {
  return { ...everyone(outcome), anonymous: SIGN_IN, ...overrides };
}

const NOT_INSTALLERS = { customer: 403, quoteCustomer: 403, curator: 403, admin: 403 } as const;

/** requireTeamMember: installers of a team; no team yet → name one; other roles → 403. */
export function teamOnly(forTeamA: Outcome, forTeamB: Outcome = forTeamA): PerActor {
  return { anonymous: SIGN_IN, ...NOT_INSTALLERS, noTeam: "→/team/new", otherTeam: forTeamB, member: forTeamA, owner: forTeamA };
}

/** requireTeamOwner: as teamOnly, but a plain member gets 403. (Team B's owner acts on team B.) */
export function ownerOnly(forOwner: Outcome, forTeamB: Outcome = forOwner): PerActor {
  return { ...teamOnly(forOwner, forTeamB), member: 403 };
}

export function roleOnly(roles: Actor[], outcome: Outcome): PerActor {
  return Object.fromEntries(ACTORS.map((a) => [a, a === "anonymous" ? SIGN_IN : roles.includes(a) ? outcome : 403])) as PerActor;
}

/** Field readings and their photos: the submitting team, curators and admins. */
export function readingViewers(forTeamA: Outcome, forTeamB: Outcome, forCuratorAdmin: Outcome = 200): PerActor {
  return {
    anonymous: SIGN_IN,
    customer: 403,
    quoteCustomer: 403,
    noTeam: 403,
    otherTeam: forTeamB,
    member: forTeamA,
    owner: forTeamA,
    curator: forCuratorAdmin,
    admin: forCuratorAdmin,
  };
}

/** A quote on a customer's account: theirs alone; anyone else signed in is told it does not exist. */
export function quoteCustomerOnly(forQuoteCustomer: Outcome): PerActor {
  return signedIn(404, { quoteCustomer: forQuoteCustomer });
}

/** requireApiActor: any session (or key); anonymous → 401 JSON. */
export function api(outcome: Outcome, overrides: Partial<PerActor> = {}): PerActor {
  return { ...everyone(outcome), anonymous: 401, ...overrides };
}

/** requireApiTeam: an installer with a team (or a team key); other signed-in people → 403 JSON. */
export function apiTeam(forTeamA: Outcome, forTeamB: Outcome = forTeamA): PerActor {
  return { anonymous: 401, ...NOT_INSTALLERS, noTeam: 403, otherTeam: forTeamB, member: forTeamA, owner: forTeamA };
}
