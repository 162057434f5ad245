// Accounts: sign-in, sign-up, password reset, better-auth's JSON endpoints, the customer's first
// password and invitations.
import { badIdPaths, postForm, postJson, withField, type HostileCase, type SeededIds } from "./hostile-corpus";
import type { FormFields } from "./hostile-http";
import { deepJson, filler, INVALID_UTF8, MEGABYTE, ODD_TEXT } from "./hostile-values";

// A failed sign-in counts against the typed address and the client address (auth_attempt_limit),
// by design: that table is the attempt counter, append-only per window.
const COUNTED = { mayWrite: ["auth_attempt_limit"] };
export const BAD_EMAILS = [
  "",
  "not-an-email",
  "a@b",
  "@example.org",
  `${"x".repeat(250)}@example.org`,
  ODD_TEXT.nul + "@example.org",
  "a@exa\u202Emple.org",
  ODD_TEXT.sql,
];

export function accountCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const signIn = (label: string, fields: FormFields, extra = {}) => postForm("sign-in / sign-up / reset", "anonymous", "/sign-in", label, fields, extra);
  for (const email of BAD_EMAILS)
    cases.push(
      signIn(`sign-in email ${JSON.stringify(email.slice(0, 30))}`, [
        ["email", email],
        ["password", "whatever-password"],
      ]),
    );
  cases.push(
    signIn("sign-in password of 10 MB", [
      ["email", "nobody@test.example"],
      ["password", filler(10 * MEGABYTE)],
    ]),
  );
  cases.push(
    signIn(
      "sign-in password with NUL, unknown account",
      [
        ["email", "nul-password@test.example"],
        ["password", "pass\u0000word"],
      ],
      COUNTED,
    ),
  );
  cases.push(
    signIn(
      "sign-in redirectTo off-site, wrong password",
      [
        ["email", "redirect@test.example"],
        ["password", "wrong-password"],
        ["redirectTo", "//evil.example/\u0000"],
      ],
      COUNTED,
    ),
  );
  cases.push(
    signIn(
      "sign-in fields repeated as arrays",
      [
        ["email", "a@test.example"],
        ["email", "b@test.example"],
        ["password", "x"],
        ["password", "y"],
      ],
      COUNTED,
    ),
  );
  cases.push(
    signIn("sign-in body of invalid UTF-8", [
      ["email", INVALID_UTF8],
      ["password", INVALID_UTF8],
    ]),
  );
  cases.push(
    signIn("sign-in with a field at list position 99 999 999", [
      ["email", "x"],
      ["junk[99999999]", "1"],
    ]),
  );
  cases.push(
    signIn("sign-in with a field name nested 10 000 levels", [
      ["email", "x"],
      [Array(10_000).fill("a").join("."), "1"],
    ]),
  );

  const signUp = (label: string, fields: FormFields) => postForm("sign-in / sign-up / reset", "anonymous", "/sign-up", label, fields);
  const newAccount: FormFields = [
    ["name", "Hostile Person"],
    ["email", "new-hostile@test.example"],
    ["password", "long-enough-password"],
  ];
  cases.push(signUp("sign-up name empty", withField(newAccount, "name", "")));
  cases.push(signUp("sign-up name of 10 MB", withField(newAccount, "name", filler(10 * MEGABYTE))));
  cases.push(signUp("sign-up password of 9 characters", withField(newAccount, "password", "123456789")));
  cases.push(signUp("sign-up password of 129 characters", withField(newAccount, "password", "p".repeat(129))));
  cases.push(signUp("sign-up email with RTL override", withField(newAccount, "email", "a@exa\u202Emple.org")));
  cases.push(signUp("sign-up name with NUL (otherwise valid)", withField(withField(newAccount, "name", ODD_TEXT.nul), "email", "nul-name@test.example")));
  cases.push(
    signUp("sign-up name of NULs only (otherwise valid)", withField(withField(newAccount, "name", ODD_TEXT.onlyNuls), "email", "nul-only@test.example")),
  );

  const forgot = (label: string, email: string) => postForm("sign-in / sign-up / reset", "anonymous", "/forgot-password", label, [["email", email]]);
  for (const email of BAD_EMAILS.slice(0, 5)) cases.push(forgot(`forgot-password email ${JSON.stringify(email.slice(0, 30))}`, email));

  const reset = (label: string, fields: FormFields) => postForm("sign-in / sign-up / reset", "anonymous", "/reset-password", label, fields);
  const resetBase: FormFields = [
    ["token", "no-such-token"],
    ["password", "long-enough-password"],
    ["confirm", "long-enough-password"],
  ];
  cases.push(reset("reset with an unknown token", resetBase));
  cases.push(reset("reset with a NUL in the token", withField(resetBase, "token", "tok\u0000en")));
  cases.push(reset("reset with a token of 1 MB", withField(resetBase, "token", filler(MEGABYTE))));
  cases.push(reset("reset passwords differ", withField(resetBase, "confirm", "other-password-here")));
  cases.push(reset("reset without a token", resetBase.slice(1)));

  // better-auth's own JSON endpoints: its limiter counts requests in its rateLimit table, and a sign-in
  // with an e-mail counts against that address in auth_attempt_limit; both are counters by design.
  const authApi = (label: string, path: string, json: string | Buffer, extra = {}) =>
    postJson("api/auth (better-auth)", "anonymous", path, label, json, { mayWrite: ["rateLimit", "auth_attempt_limit"], ...extra });
  cases.push(authApi("sign-in JSON not JSON", "/api/auth/sign-in/email", "{email:"));
  cases.push(authApi("sign-in JSON nested 10 000 levels", "/api/auth/sign-in/email", deepJson(10_000, "object")));
  cases.push(authApi("sign-in JSON email a number", "/api/auth/sign-in/email", JSON.stringify({ email: 12, password: [] })));
  cases.push(authApi("sign-in JSON of 10 MB", "/api/auth/sign-in/email", Buffer.concat([Buffer.from('{"email":"'), filler(10 * MEGABYTE), Buffer.from('"}')])));
  cases.push(
    authApi(
      "sign-up JSON name with NUL",
      "/api/auth/sign-up/email",
      JSON.stringify({ name: ODD_TEXT.nul, email: "json-nul@test.example", password: "long-enough-password" }),
    ),
  );
  cases.push(
    authApi(
      "sign-up JSON name a lone surrogate",
      "/api/auth/sign-up/email",
      JSON.stringify({ name: "\uD800", email: "json-surrogate@test.example", password: "long-enough-password" }),
    ),
  );
  cases.push(
    authApi("sign-up JSON of invalid UTF-8", "/api/auth/sign-up/email", Buffer.concat([Buffer.from('{"name":"'), INVALID_UTF8, Buffer.from('","email":"x"}')])),
  );

  // The customer's first password, through the link of the quote e-mail.
  const access = (label: string, token: string, fields: FormFields) => postForm("quote-access", "anonymous", `/quote-access/${token}`, label, fields);
  const token = ids.quoteAccessToken;
  cases.push(
    access("first password of 9 characters", token, [
      ["password", "123456789"],
      ["confirmPassword", "123456789"],
    ]),
  );
  cases.push(
    access("first passwords differ", token, [
      ["password", "long-enough-password"],
      ["confirmPassword", "other-password-x"],
    ]),
  );
  cases.push(
    access("first password of 129 characters", token, [
      ["password", "p".repeat(129)],
      ["confirmPassword", "p".repeat(129)],
    ]),
  );
  cases.push(
    access("first password of 10 MB", token, [
      ["password", filler(10 * MEGABYTE)],
      ["confirmPassword", "x"],
    ]),
  );
  cases.push(access("first password missing", token, []));
  cases.push(
    access("first password with NUL, confirmation differs", token, [
      ["password", "long\u0000password"],
      ["confirmPassword", "longpassword"],
    ]),
  );
  for (const { id } of badIdPaths((id) => id).slice(0, 4))
    cases.push(
      access(`token ${id.slice(0, 20)}`, id, [
        ["password", "long-enough-password"],
        ["confirmPassword", "long-enough-password"],
      ]),
    );
  cases.push(
    access("token of 10 000 characters", "A".repeat(10_000), [
      ["password", "long-enough-password"],
      ["confirmPassword", "long-enough-password"],
    ]),
  );

  const invitation = (label: string, id: string) => postForm("team", "loner", `/invitations/${id}`, label, [["intent", "accept"]]);
  for (const { id } of badIdPaths((id) => id)) cases.push(invitation(`accept invitation ${id.slice(0, 20)}`, id));

  return cases;
}
