// Browser: a new installer signs up, names the team, invites a colleague; the invitation reaches the
// fake outbox; the colleague follows the link, creates an account, joins and sees the team.
import { expect, it } from "vitest";
import { mailTo, openBrowser, snap } from "./helpers/browser";

it("signs up, names a team, invites a colleague who joins from the e-mail", async () => {
  const stamp = Date.now().toString(36);
  const ownerEmail = `owner-${stamp}@e2e.example`;
  const colleagueEmail = `colleague-${stamp}@e2e.example`;
  const teamName = `Ridgeline Sparks ${stamp}`;

  const owner = await openBrowser();
  const page = owner.page;
  await page.goto("/");
  await page.getByRole("link", { name: "Create an installer account" }).first().click();
  await page.getByLabel("Your name").fill("Wren Halloway");
  await page.getByLabel("E-mail").fill(ownerEmail);
  await page.getByLabel("Password").fill("a-long-enough-password");
  await page.getByRole("button", { name: "Create account" }).click();

  await page.getByLabel("Team name").waitFor();
  await page.getByLabel("Team name").fill(teamName);
  await page.getByRole("button", { name: "Create the team" }).click();
  await page.waitForURL((url) => url.pathname === "/team");
  await page.getByRole("heading", { name: teamName, exact: true }).waitFor();
  expect(await page.getByRole("status").textContent()).toContain("is ready");

  await page.getByLabel("Their e-mail").fill(colleagueEmail);
  await page.getByRole("button", { name: "Send invitation" }).click();
  await page.getByText(`Invitation sent to ${colleagueEmail}`).waitFor();
  await snap(page, "team-after-invite");

  // The outbox page shows the message as the colleague would read it.
  await page.goto(`/dev/outbox?to=${encodeURIComponent(colleagueEmail)}`);
  await page.getByText(`Wren Halloway invited you to ${teamName} on Kitwright`).waitFor();
  const mail = await mailTo(colleagueEmail, teamName);
  const link = mail.text.match(/https?:\/\/\S+\/invitations\/\S+/)![0];
  await owner.close();

  const colleague = await openBrowser({ width: 390, height: 844 });
  const cpage = colleague.page;
  await cpage.goto(link);
  await cpage.getByRole("heading", { name: `Join ${teamName}` }).waitFor();
  await cpage.getByRole("link", { name: "Create an account" }).last().click();
  await cpage.getByLabel("Your name").fill("Ossian Brae");
  await cpage.getByLabel("E-mail").fill(colleagueEmail);
  await cpage.getByLabel("Password").fill("another-long-password");
  await cpage.getByRole("button", { name: "Create account" }).click();
  await cpage.getByRole("button", { name: `Join ${teamName}` }).click();
  await cpage.waitForURL((url) => url.pathname === "/team");
  await cpage.getByRole("heading", { name: teamName, exact: true }).waitFor();
  expect(await cpage.getByRole("status").textContent()).toContain(`Welcome to ${teamName}`);
  const members = cpage.getByRole("listitem").filter({ hasText: "@e2e.example" });
  expect(await members.allTextContents()).toEqual([expect.stringContaining("Wren Halloway"), expect.stringContaining("Ossian Brae")]);
  await snap(cpage, "colleague-joined-phone");
  await colleague.close();
});
