// line_items for payment mode: only inline price_data is modelled, since the fake keeps no
// catalogue of Stripe Prices or Products.
import { invalidParam, missingParam, StripeFakeError } from "./stripe-errors.ts";
import { newId, type LineItem } from "./payments-state.ts";

export function readLineItems(value: unknown): LineItem[] {
  if (value === undefined || value === "") throw missingParam("line_items");
  if (!Array.isArray(value) || value.length === 0) {
    throw invalidParam("line_items", "line_items must be a non-empty list.");
  }
  const items = value.map((raw, index) => readLineItem(raw, `line_items[${index}]`));
  const currencies = new Set(items.map((item) => item.currency));
  if (currencies.size > 1) {
    throw invalidParam("line_items", "All line_items must use the same currency.");
  }
  return items;
}

function readLineItem(raw: unknown, param: string): LineItem {
  const item = asObject(raw, param);
  if (item.price !== undefined) {
    throw new StripeFakeError(400, `No such price: '${String(item.price)}' (the payments fake supports price_data only)`, {
      code: "resource_missing",
      param: `${param}[price]`,
    });
  }
  if (item.price_data === undefined) throw missingParam(`${param}[price_data]`);
  const priceData = asObject(item.price_data, `${param}[price_data]`);

  const currency = priceData.currency;
  if (currency === undefined) throw missingParam(`${param}[price_data][currency]`);
  if (typeof currency !== "string" || !/^[a-zA-Z]{3}$/.test(currency)) {
    throw invalidParam(`${param}[price_data][currency]`, `Invalid currency: ${String(currency)}`);
  }
  if (priceData.unit_amount === undefined) throw missingParam(`${param}[price_data][unit_amount]`);
  const unitAmount = toInteger(priceData.unit_amount);
  if (unitAmount === null || unitAmount < 0) {
    throw invalidParam(`${param}[price_data][unit_amount]`, "Invalid non-negative integer: unit_amount");
  }
  if (priceData.product_data === undefined) throw missingParam(`${param}[price_data][product_data]`);
  const productData = asObject(priceData.product_data, `${param}[price_data][product_data]`);
  const name = productData.name;
  if (typeof name !== "string" || name.trim() === "") {
    throw missingParam(`${param}[price_data][product_data][name]`);
  }
  if (item.quantity === undefined) throw missingParam(`${param}[quantity]`);
  const quantity = toInteger(item.quantity);
  if (quantity === null || quantity < 1) {
    throw invalidParam(`${param}[quantity]`, "Invalid positive integer: quantity");
  }

  const lowerCurrency = currency.toLowerCase();
  return {
    id: newId("li_"),
    object: "item",
    amount_subtotal: unitAmount * quantity,
    amount_total: unitAmount * quantity,
    currency: lowerCurrency,
    description: name,
    quantity,
    price: { object: "price", unit_amount: unitAmount, currency: lowerCurrency, product_name: name },
  };
}

function asObject(value: unknown, param: string): Record<string, unknown> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw invalidParam(param, `Invalid object: ${param}`);
  }
  return value as Record<string, unknown>;
}

function toInteger(value: unknown): number | null {
  const text = typeof value === "number" ? String(value) : value;
  if (typeof text !== "string" || !/^\d{1,12}$/.test(text)) return null;
  return Number(text);
}
