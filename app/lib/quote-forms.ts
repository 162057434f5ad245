// Forms of the quote pages: the installer's editor, sending, and the customer's decision. Money and
// percentages stay decimal text (decimal.js parses them); one schema serves the page and the server.
import Decimal from "decimal.js";
import { z } from "zod";
import { QUOTE_LINE_KINDS } from "~/domain/quotes/quote-types";
import { OFFER_PART_KINDS } from "~/domain/sourcing/offer-facts";
import { decimalText, isoDateField } from "./sourcing-forms";
import { nameField } from "./name-field";

function percent(label: string, max: number, { positive = false } = {}) {
  return decimalText(label, { maxDecimals: 3, positive }).refine((v) => new Decimal(v).lte(max), `The ${label} can be at most ${max} %.`);
}

/** A line's own percentage: blank means the quote-wide figure applies. */
function linePercent(label: string, max: number) {
  return percent(label, max).optional();
}

export const quoteLineSchema = z.object({
  kind: z.enum(QUOTE_LINE_KINDS, "Choose what kind of line this is."),
  description: nameField("Describe the line.", { max: 300, tooLong: "Keep it under 300 characters." }),
  quantity: decimalText("quantity", { maxDecimals: 3, positive: true }),
  unitCost: decimalText("unit cost", { maxDecimals: 4 }),
  marginPct: linePercent("margin", 1000),
  discountPct: linePercent("discount", 100),
  taxRatePct: linePercent("tax rate", 100),
  partKind: z.enum(OFFER_PART_KINDS).optional(),
  partId: z.uuid().optional(),
  offerId: z.uuid().optional(),
});
export type QuoteLineForm = z.output<typeof quoteLineSchema>;

export const quoteEditorSchema = z.object({
  title: nameField("Give the quote a title.", { max: 160 }),
  customerName: nameField("Enter the customer's name."),
  customerEmail: z.email("Enter the customer's e-mail address, e.g. name@example.org.").trim().toLowerCase().max(254),
  marginPct: percent("margin", 1000),
  discountPct: percent("discount", 100),
  taxRatePct: percent("tax rate", 100),
  depositPct: percent("deposit", 100, { positive: true }),
  validUntil: isoDateField,
  terms: z.string().trim().max(8000, "Keep the terms under 8000 characters.").optional(),
  note: z.string().trim().max(500).optional(),
  lines: z.array(quoteLineSchema, "Add at least one line.").min(1, "Add at least one line.").max(200, "A quote can have at most 200 lines."),
});
export type QuoteEditorForm = z.output<typeof quoteEditorSchema>;

export const newQuoteSchema = z.object({
  planId: z.uuid("Choose a kit plan."),
});

export const approveSchema = z.object({
  acceptedName: z.string({ error: "Type your full name to approve." }).trim().min(2, "Type your full name to approve.").max(120),
  confirm: z.literal("on", "Tick the box to confirm that you approve this quote."),
});

export const declineSchema = z.object({
  comment: z.string({ error: "Tell the installer why, so they can revise the quote." }).trim().min(3, "Say a few words about why.").max(2000),
});

export const firstPasswordSchema = z
  .object({
    password: z.string({ error: "Choose a password." }).min(10, "Use at least 10 characters.").max(128),
    confirmPassword: z.string({ error: "Type the password again." }),
  })
  .refine((v) => v.password === v.confirmPassword, { path: ["confirmPassword"], message: "The two passwords differ." });

export const QUOTE_LIST_STATUSES = ["all", "open", "draft", "sent", "viewed", "approved", "declined", "expired", "withdrawn", "deposit_paid"] as const;
