import { describe, expect, it } from "vitest";
import { RouteClient } from "./helpers/route-client";
import { firstLink, latestMailTo, PASSWORD, signUpUser } from "./helpers/fixtures";
import * as signIn from "~/routes/sign-in";
import * as signUp from "~/routes/sign-up";
import * as signOut from "~/routes/sign-out";
import * as home from "~/routes/home";
import * as forgotPassword from "~/routes/forgot-password";
import * as resetPassword from "~/routes/reset-password";
import { db } from "~/server/db.server";

describe("sign-up and sign-in", () => {
  it("creates a user and signs them in at once", async () => {
    const { client, email, userId } = await signUpUser("signup");
    const sessions = await db.selectFrom("session").select("id").where("userId", "=", userId).execute();
    expect(sessions).toHaveLength(1);
    const page = await client.loader(home, "/");
    expect(page.data.user.name).toBe("Test signup");
    expect(page.data.needsTeam).toBe(true);
    const user = await db.selectFrom("user").select("role").where("email", "=", email).executeTakeFirstOrThrow();
    expect(user.role).toBe("installer");
  });

  it("refuses a second account with the same e-mail, at the field", async () => {
    const { email } = await signUpUser("twice");
    const result = await new RouteClient().action(signUp, "/sign-up", { name: "Someone Else", email, password: PASSWORD });
    expect(result.status).toBe(409);
    expect(result.data.result.error.email[0]).toMatch(/already exists/);
  });

  it("rejects a short password and a bad e-mail with field messages, and saves nothing", async () => {
    const result = await new RouteClient().action(signUp, "/sign-up", { name: "Short Pw", email: "not-an-address", password: "short" });
    expect(result.status).toBe(400);
    expect(result.data.result.error.email).toBeTruthy();
    expect(result.data.result.error.password[0]).toMatch(/10 characters/);
    const rows = await db.selectFrom("user").select("id").where("name", "=", "Short Pw").execute();
    expect(rows).toHaveLength(0);
  });

  it("refuses a wrong password and sets no session cookie", async () => {
    const { email } = await signUpUser("wrongpw");
    const client = new RouteClient();
    const result = await client.action(signIn, "/sign-in", { email, password: "not-the-password" });
    expect(result.status).toBe(401);
    expect(result.headers.getSetCookie()).toHaveLength(0);
    expect((await client.loader(home, "/")).data.user).toBeNull();
  });

  it("signs in with the right password, follows only same-site redirects, and signs out", async () => {
    const { email } = await signUpUser("rightpw");
    const client = new RouteClient();
    const evil = await client.action(signIn, "/sign-in", { email, password: PASSWORD, redirectTo: "//evil.example/x" });
    expect(evil.status).toBe(302);
    expect(evil.location).toBe("/");
    expect((await client.loader(home, "/")).data.user).not.toBeNull();
    const out = await client.action(signOut, "/sign-out", {});
    expect(out.status).toBe(302);
    expect((await client.loader(home, "/")).data.user).toBeNull();
  });
});

describe("password reset by e-mail", () => {
  it("mails a link whose token sets a new password; the old one stops working", async () => {
    const { email } = await signUpUser("reset");
    const request = await new RouteClient().action(forgotPassword, "/forgot-password", { email });
    expect(request.status).toBe(302);
    const mail = await latestMailTo(email);
    expect(mail.subject).toMatch(/Reset your Kitwright password/);
    const link = firstLink(mail.text, "/reset-password");
    const token = link.searchParams.get("token")!;
    const newPassword = "a-brand-new-password";
    const reset = await new RouteClient().action(resetPassword, "/reset-password", { token, password: newPassword, confirm: newPassword });
    expect(reset.status).toBe(302);
    expect((await new RouteClient().action(signIn, "/sign-in", { email, password: PASSWORD })).status).toBe(401);
    expect((await new RouteClient().action(signIn, "/sign-in", { email, password: newPassword })).status).toBe(302);
    const again = await new RouteClient().action(resetPassword, "/reset-password", { token, password: "yet-another-pass", confirm: "yet-another-pass" });
    expect(again.status).toBe(400);
  });

  it("answers the same for an address with no account and sends nothing", async () => {
    const email = "nobody-here@test.example";
    const result = await new RouteClient().action(forgotPassword, "/forgot-password", { email });
    expect(result.status).toBe(302);
    await new Promise((r) => setTimeout(r, 300));
    const { listOutbox } = await import("~/server/outbox.server");
    expect(await listOutbox(email)).toHaveLength(0);
  });
});
