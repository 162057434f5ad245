import { describe, expect, it } from "vitest";
import { ParamsError, parseStripeForm } from "../../../fakes/stripe-params.ts";

describe("parseStripeForm", () => {
  it("rebuilds nested objects and arrays from bracketed keys", () => {
    const body = new URLSearchParams([
      ["mode", "payment"],
      ["line_items[1][quantity]", "2"],
      ["line_items[0][price_data][unit_amount]", "500"],
      ["line_items[0][price_data][product_data][name]", "Panel & mount"],
      ["line_items[0][quantity]", "1"],
      ["metadata[quoteId]", "q1"],
      ["expand[]", "line_items"],
      ["expand[]", "payment_intent"],
    ]).toString();

    expect(parseStripeForm(body)).toEqual({
      mode: "payment",
      line_items: [{ price_data: { unit_amount: "500", product_data: { name: "Panel & mount" } }, quantity: "1" }, { quantity: "2" }],
      metadata: { quoteId: "q1" },
      expand: ["line_items", "payment_intent"],
    });
  });

  it("refuses prototype keys and conflicting shapes", () => {
    expect(() => parseStripeForm("__proto__[polluted]=1")).toThrow(ParamsError);
    expect(() => parseStripeForm("a=1&a[b]=2")).toThrow(ParamsError);
    expect(() => parseStripeForm("a[b]=2&a=1")).toThrow(ParamsError);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});
