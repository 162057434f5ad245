// Minor units for the card processor: each expected value worked by hand beside it; exponents from
// ISO 4217 (EUR 2, JPY 0, KWD 3).
import { describe, expect, it } from "vitest";
import { money, moneyText } from "~/domain/money/money";
import { fromMinorUnits, toMinorUnits } from "~/domain/money/minor-units";

describe("minor units", () => {
  it("converts exactly where a float would not", () => {
    // 4.35 × 100 = 435 (as floats, 4.35 * 100 = 434.99999999999994)
    expect(toMinorUnits(money("4.35", "EUR"))).toBe(435);
    expect(toMinorUnits(money("1234.56", "EUR"))).toBe(123456);
    // 0.29 × 100 = 29 (as floats, 28.999999999999996)
    expect(toMinorUnits(money("0.29", "usd"))).toBe(29);
    expect(toMinorUnits(money("1500", "JPY"))).toBe(1500);
    expect(toMinorUnits(money("12.345", "KWD"))).toBe(12345);
  });

  it("refuses an amount finer than the minor unit instead of rounding it", () => {
    expect(() => toMinorUnits(money("10.005", "EUR"))).toThrow(RangeError);
    expect(() => toMinorUnits(money("1500.5", "JPY"))).toThrow(RangeError);
  });

  it("reads minor units back as decimal money", () => {
    expect(moneyText(fromMinorUnits(123456, "eur"))).toBe("1234.56");
    expect(fromMinorUnits(123456, "eur").currency).toBe("EUR");
    expect(moneyText(fromMinorUnits(12345, "KWD"))).toBe("12.345");
    expect(() => fromMinorUnits(1.5, "EUR")).toThrow(RangeError);
  });
});
