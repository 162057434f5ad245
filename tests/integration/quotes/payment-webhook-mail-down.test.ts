// When the mail server refuses the receipt, the deposit is still recorded and Stripe still gets its
// 2xx (a retry would not send the mail either: the move to paid happens once). Only the mail sender
// is replaced here; the database and the webhook path are real.
import { afterAll, describe, expect, it, vi } from "vitest";
import { db } from "~/server/db.server";
import { approvedQuote, deliver, sessionCompleted } from "./quote-fixtures";

vi.mock("~/server/mail.server", async (importOriginal) => ({
  ...(await importOriginal<typeof import("~/server/mail.server")>()),
  sendMail: vi.fn(async () => {
    throw new Error("SMTP 451: try again later");
  }),
}));

const logged = vi.spyOn(console, "error").mockImplementation(() => {});
afterAll(() => logged.mockRestore());

describe("deposit webhook with the mail server down", () => {
  it("records the payment, answers 200 and logs each mail that failed", async () => {
    const q = await approvedQuote("wh-mail-down");
    const result = await deliver(sessionCompleted(q.sessionId, q.quoteId, "pi_test_mail_down"));
    expect(result.status).toBe(200);
    expect(result.data.outcome).toBe("paid");
    const payment = await db.selectFrom("quote_payment").select("status").where("checkout_session_id", "=", q.sessionId).executeTakeFirstOrThrow();
    expect(payment.status).toBe("paid");
    const lines = logged.mock.calls.flatMap(([line]) => (String(line).startsWith("{") ? [JSON.parse(String(line)) as { msg: string; subject: string }] : []));
    // The customer's receipt and one notice each for the owner and the quote's author.
    expect(
      lines
        .filter((l) => l.msg === "deposit mail failed")
        .map((l) => l.subject)
        .sort(),
    ).toEqual(["Deposit paid on Q-0001 by Mira Tallow", "Deposit paid on Q-0001 by Mira Tallow", "Deposit received for quote Q-0001"]);
  });
});
