// The team (naming it, inviting, cancelling, removing), its API keys, and the admin's user list.
import { badIdPaths, get, postForm, type HostileCase, type SeededIds } from "./hostile-corpus";
import { BAD_EMAILS } from "./hostile-corpus-accounts";
import type { FormFields } from "./hostile-http";
import { filler, MEGABYTE, ODD_TEXT } from "./hostile-values";

export function teamCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const teamNew = (label: string, name: string | Buffer) => postForm("team", "loner", "/team/new", label, [["name", name]]);
  cases.push(teamNew("team name empty", ""));
  cases.push(teamNew("team name of 1 character", "x"));
  cases.push(teamNew("team name of 81 characters", "t".repeat(81)));
  cases.push(teamNew("team name of 10 MB", filler(10 * MEGABYTE)));
  cases.push(teamNew("team name zero-width only", ODD_TEXT.zeroWidth));
  cases.push(teamNew("team name with NUL (otherwise valid)", ODD_TEXT.nul));

  const team = (label: string, fields: FormFields) => postForm("team", "installer", "/team", label, fields);
  cases.push(team("no intent", [["email", "colleague@test.example"]]));
  cases.push(
    team("unknown intent", [
      ["intent", "promote"],
      ["memberId", ids.memberId],
    ]),
  );
  for (const email of BAD_EMAILS)
    cases.push(
      team(`invite ${JSON.stringify(email.slice(0, 30))}`, [
        ["intent", "invite"],
        ["email", email],
      ]),
    );
  cases.push(
    team("cancel an invitation that does not exist", [
      ["intent", "cancel-invitation"],
      ["invitationId", "no-such-invitation"],
    ]),
  );
  cases.push(
    team("cancel an invitation id with NUL", [
      ["intent", "cancel-invitation"],
      ["invitationId", "inv\u0000itation"],
    ]),
  );
  cases.push(
    team("cancel an invitation id of 101 characters", [
      ["intent", "cancel-invitation"],
      ["invitationId", "i".repeat(101)],
    ]),
  );
  cases.push(
    team("remove a member that does not exist", [
      ["intent", "remove-member"],
      ["memberId", "no-such-member"],
    ]),
  );
  cases.push(
    team("remove a member id with NUL", [
      ["intent", "remove-member"],
      ["memberId", `${ids.memberId}\u0000`],
    ]),
  );

  const keys = (label: string, fields: FormFields) => postForm("team", "installer", "/team/api-keys", label, fields);
  cases.push(keys("no intent", [["name", "Integration"]]));
  cases.push(
    keys("create with an empty name", [
      ["intent", "create"],
      ["name", " "],
    ]),
  );
  cases.push(
    keys("create with a name of 61 characters", [
      ["intent", "create"],
      ["name", "k".repeat(61)],
    ]),
  );
  cases.push(
    keys("create with a name of 10 MB", [
      ["intent", "create"],
      ["name", filler(10 * MEGABYTE)],
    ]),
  );
  cases.push(
    keys("create with a NUL in the name (otherwise valid)", [
      ["intent", "create"],
      ["name", ODD_TEXT.nul],
    ]),
  );
  for (const { id } of badIdPaths((id) => decodeURIComponent(id)).slice(0, 4))
    cases.push(
      keys(`revoke ${id.slice(0, 20)}`, [
        ["intent", "revoke"],
        ["keyId", id],
      ]),
    );
  cases.push(
    keys("revoke an unknown key", [
      ["intent", "revoke"],
      ["keyId", "00000000-0000-4000-8000-000000000000"],
    ]),
  );

  const admin = (label: string, fields: FormFields) => postForm("admin", "admin", "/admin/users", label, fields);
  cases.push(admin("role missing", [["userId", ids.otherUserId]]));
  cases.push(
    admin("role superuser", [
      ["userId", ids.otherUserId],
      ["role", "superuser"],
    ]),
  );
  cases.push(
    admin("role given twice", [
      ["userId", ids.otherUserId],
      ["role", "admin"],
      ["role", "curator"],
    ]),
  );
  cases.push(
    admin("own admin role removed", [
      ["userId", ids.adminUserId],
      ["role", "installer"],
    ]),
  );
  cases.push(
    admin("unknown user", [
      ["userId", "no-such-user"],
      ["role", "curator"],
    ]),
  );
  cases.push(
    admin("user id with NUL", [
      ["userId", `${ids.otherUserId}\u0000`],
      ["role", "curator"],
    ]),
  );
  cases.push(
    admin("user id of 10 MB", [
      ["userId", filler(10 * MEGABYTE)],
      ["role", "curator"],
    ]),
  );
  cases.push(get("admin", "admin", `/admin/users?q=${encodeURIComponent(ODD_TEXT.nul)}&page=-1`, "user search with NUL, page -1", { expect: "not5xx" }));
  cases.push(get("admin", "admin", `/admin/users?q=%25%27%22&page=1e309`, "user search with % and quotes, page 1e309", { expect: "not5xx" }));
  return cases;
}
