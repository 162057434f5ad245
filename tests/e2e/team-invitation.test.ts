// Browser: a new installer signs up, names the team, invites a colleague; the invitation reaches the
// fake outbox; the colleague follows the link, creates an account, joins and sees the team.
import { expect, it } from "vitest";
import { openBrowser, snap } from "./helpers/browser";

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

  await owner.close();

  // The colleague reads the invitation on the development outbox page, as a mail program would show it,
  // and follows the link inside the rendered message.
  const colleague = await openBrowser({ width: 390, height: 844 });
  const cpage = colleague.page;
  await cpage.goto(`/dev/outbox?to=${encodeURIComponent(colleagueEmail)}`);
  const message = cpage.getByTestId("outbox-message");
  await message.first().waitFor();
  expect(await message.count()).toBe(1);
  const row = (name: string) => message.locator(`dt:text-is("${name}") + dd`).textContent();
  expect(await row("Subject")).toBe(`Wren Halloway invited you to ${teamName} on Kitwright`);
  expect(await row("From")).toBe(process.env.MAIL_FROM ?? "Kitwright <no-reply@kitwright.invalid>");
  expect(await row("To")).toBe(colleagueEmail);
  expect(await row("Received")).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2} UTC$/);
  const body = cpage.frameLocator(`iframe[title="Message: Wren Halloway invited you to ${teamName} on Kitwright"]`);
  await body.getByText(`invited you to join the team "${teamName}"`).waitFor();
  await body.getByRole("link", { name: "Join the team" }).click();
  await cpage.waitForURL((url) => url.pathname.startsWith("/invitations/"));
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
