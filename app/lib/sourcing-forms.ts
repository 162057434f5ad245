// Forms of the sourcing pages. Money fields stay text (checked by decimalProblem, parsed later with
// decimal.js); only counts and days are numbers.
import { z } from "zod";
import { isCurrencyCode } from "~/domain/money/money";
import { canonicalDecimal, decimalProblem, type DecimalRules } from "~/domain/sourcing/decimal-text";
import { OFFER_PART_KINDS } from "~/domain/sourcing/offer-facts";
import { isIsoDate } from "~/domain/sourcing/offer-validity";
import { nameField } from "./name-field";

export const MONEY_RULES: DecimalRules = { maxDecimals: 6 };
export const RATE_RULES: DecimalRules = { maxDecimals: 10, positive: true };

export function decimalText(label: string, rules: DecimalRules = MONEY_RULES) {
  return z
    .string({ error: `Enter the ${label}.` })
    .superRefine((text, ctx) => {
      const problem = decimalProblem(text, label, rules);
      if (problem) ctx.addIssue({ code: "custom", message: problem });
    })
    .transform(canonicalDecimal);
}

/** A money field left blank means 0 (shipping, for example). */
function optionalMoney(label: string) {
  return decimalText(label).optional();
}

export const currencyField = z
  .string({ error: "Enter a three-letter currency code, e.g. EUR." })
  .trim()
  .transform((s) => s.toUpperCase())
  .refine(isCurrencyCode, "Use a three-letter ISO 4217 code, e.g. EUR, GBP, CHF.");

const wholeNumber = (label: string, min: number) =>
  z
    .number({ error: (issue) => (issue.input === undefined ? `Enter the ${label}.` : `The ${label} must be a whole number.`) })
    .int(`The ${label} must be a whole number.`)
    .min(min, `The ${label} must be at least ${min}.`)
    .max(1_000_000, `The ${label} is too large.`);

export const isoDateField = z.string({ error: "Enter a date as YYYY-MM-DD." }).trim().refine(isIsoDate, "Enter a real date as YYYY-MM-DD, e.g. 2027-03-31.");

export const supplierFormSchema = z.object({
  name: nameField("Name the supplier."),
  contact: z.string().trim().max(500).optional(),
  currency: currencyField,
  shippingTerms: z.string().trim().max(500).optional(),
  defaultShippingPerUnit: optionalMoney("shipping per unit"),
  defaultShippingPerOrder: optionalMoney("shipping per order"),
  defaultLeadTimeDays: wholeNumber("lead time", 0).optional(),
  notes: z.string().trim().max(4000).optional(),
});
export type SupplierForm = z.output<typeof supplierFormSchema>;

const priceBreakSchema = z.object({
  minQuantity: wholeNumber("break quantity", 2),
  unitPrice: decimalText("break price"),
});

export const offerFormSchema = z
  .object({
    supplierId: z.string({ error: "Choose the supplier." }).uuid("Choose the supplier."),
    partKind: z.enum(OFFER_PART_KINDS, "Choose the kind of part."),
    partId: z.string({ error: "Choose the part from the catalogue." }).uuid("Choose the part from the catalogue."),
    sku: z.string().trim().max(80).optional(),
    currency: currencyField.optional(),
    unitPrice: decimalText("unit price"),
    priceBreaks: z.array(priceBreakSchema).max(12, "At most 12 price breaks.").optional(),
    minimumOrder: wholeNumber("minimum order", 1).optional(),
    shippingPerUnit: optionalMoney("shipping per unit"),
    shippingPerOrder: optionalMoney("shipping per order"),
    leadTimeDays: wholeNumber("lead time", 0).optional(),
    stock: wholeNumber("stock", 0).optional(),
    validUntil: isoDateField.optional(),
    notes: z.string().trim().max(2000).optional(),
  })
  .superRefine((offer, ctx) => {
    const seen = new Map<number, number>();
    (offer.priceBreaks ?? []).forEach((b, i) => {
      if (!b) return;
      const first = seen.get(b.minQuantity);
      if (first !== undefined)
        ctx.addIssue({ code: "custom", path: ["priceBreaks", i, "minQuantity"], message: `Break ${first + 1} already starts at ${b.minQuantity}.` });
      else seen.set(b.minQuantity, i);
    });
  });
export type OfferForm = z.output<typeof offerFormSchema>;

export const ratesActionSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("currency"), quotingCurrency: currencyField }),
  z
    .object({
      intent: z.literal("add-rate"),
      fromCurrency: currencyField,
      toCurrency: currencyField,
      rate: decimalText("rate", RATE_RULES),
      asOf: isoDateField,
    })
    .refine((r) => r.fromCurrency !== r.toCurrency, { path: ["toCurrency"], message: "Choose two different currencies." }),
  z.object({ intent: z.literal("delete-rate"), rateId: z.string().uuid() }),
]);
export type RatesAction = z.output<typeof ratesActionSchema>;
