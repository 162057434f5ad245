// Typed and imported money text: what is refused and why, and the text that is kept.
import { describe, expect, it } from "vitest";
import { canonicalDecimal, decimalProblem } from "~/domain/sourcing/decimal-text";

const rules = { maxDecimals: 6 };

describe("decimal text", () => {
  it("accepts plain decimals and keeps them exact", () => {
    for (const ok of ["0", "0.1", "12.50", "58.5", "0.000001", "+3"]) expect(decimalProblem(ok, "price", rules)).toBeNull();
    expect(canonicalDecimal("012.50")).toBe("12.50");
    expect(canonicalDecimal("+3")).toBe("3");
    expect(canonicalDecimal("0.30")).toBe("0.30");
  });

  it("names the problem in words", () => {
    expect(decimalProblem("", "unit price", rules)).toBe("Enter the unit price.");
    expect(decimalProblem("12,50", "unit price", rules)).toMatch(/decimal point.*12\.50/);
    expect(decimalProblem("-1", "unit price", rules)).toMatch(/cannot be negative/);
    expect(decimalProblem("€12", "unit price", rules)).toMatch(/plain number/);
    expect(decimalProblem("1,234.50", "unit price", rules)).toMatch(/thousands separators/);
    expect(decimalProblem("1e3", "unit price", rules)).toMatch(/plain number/);
    expect(decimalProblem("0.1234567", "unit price", rules)).toMatch(/at most 6 digits/);
    expect(decimalProblem("1234567890123", "unit price", rules)).toMatch(/too large/);
    expect(decimalProblem("0.000", "rate", { maxDecimals: 10, positive: true })).toMatch(/above 0/);
  });
});
