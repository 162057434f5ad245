// Who may do what at each status (common practice for quotes, no source: these are Kitwright's rules).
import { describe, expect, it } from "vitest";
import {
  customerCanDecide,
  customerCanPay,
  effectiveStatus,
  formatQuoteNumber,
  teamCanRevise,
  teamCanWithdraw,
  visibleToCustomer,
} from "~/domain/quotes/quote-status";

describe("quote status", () => {
  it("expires a sent or opened quote after its last valid day, and nothing else", () => {
    expect(effectiveStatus("sent", "2026-12-01", "2026-12-01")).toBe("sent");
    expect(effectiveStatus("sent", "2026-11-30", "2026-12-01")).toBe("expired");
    expect(effectiveStatus("viewed", "2026-11-30", "2026-12-01")).toBe("expired");
    expect(effectiveStatus("approved", "2026-11-30", "2026-12-01")).toBe("approved");
    expect(effectiveStatus("draft", "2026-11-30", "2026-12-01")).toBe("draft");
  });

  it("settles a quote once the customer approves it", () => {
    expect(teamCanRevise("approved")).toBe(false);
    expect(teamCanRevise("deposit_paid")).toBe(false);
    expect(teamCanRevise("declined")).toBe(true);
    expect(teamCanWithdraw("approved")).toBe(false);
    expect(customerCanDecide("viewed")).toBe(true);
    expect(customerCanDecide("expired")).toBe(false);
    expect(customerCanPay("approved")).toBe(true);
    expect(customerCanPay("deposit_paid")).toBe(false);
    expect(visibleToCustomer("withdrawn")).toBe(false);
    expect(formatQuoteNumber(7)).toBe("Q-0007");
  });
});
