// Quotes: drafting from a plan, the installer's editor (save / send / withdraw), and the customer's
// decision and deposit (approve / decline / pay).
import { badIdPaths, get, postForm, toFields, withField, without, type HostileCase, type SeededIds } from "./hostile-corpus";
import type { FormFields } from "./hostile-http";
import { BAD_NUMBERS, filler, MEGABYTE, ODD_TEXT } from "./hostile-values";

export const CUSTOMER_EMAIL = "hostile-customer@test.example";
export const SECOND_CUSTOMER_EMAIL = "hostile-second-customer@test.example";

export function quoteEditorFields(title = "Hostile test quote", lineDescription = "Installation labour"): FormFields {
  return toFields({
    title,
    customerName: "Hostile Customer",
    customerEmail: CUSTOMER_EMAIL,
    marginPct: "20",
    discountPct: "0",
    taxRatePct: "10",
    depositPct: "30",
    validUntil: "2099-12-31",
    terms: "Payable within 30 days.",
    lines: [{ kind: "labour", description: lineDescription, quantity: "8", unitCost: "45.50" }],
  });
}

export function quoteCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const family = "quotes";
  const draft = (label: string, fields: FormFields) => postForm(family, "installer", "/quotes", `draft: ${label}`, fields);
  cases.push(draft("plan missing", []));
  cases.push(draft("plan id with SQL", [["planId", ODD_TEXT.sql]]));
  cases.push(draft("unknown plan", [["planId", "00000000-0000-4000-8000-000000000000"]]));
  cases.push(draft("plan id with NUL", [["planId", `${ids.planId}\u0000`]]));
  cases.push(
    draft("plan given twice", [
      ["planId", ids.planId],
      ["planId", "x"],
    ]),
  );
  cases.push(
    get(family, "installer", `/quotes?status=${encodeURIComponent(ODD_TEXT.sql)}&q=${encodeURIComponent(ODD_TEXT.nul)}`, "list with odd filters", {
      expect: "not5xx",
    }),
  );

  const editor = quoteEditorFields();
  const save = (label: string, fields: FormFields, quoteId = ids.draftQuoteId) =>
    postForm(family, "installer", `/quotes/${quoteId}`, `save: ${label}`, [["intent", "save"], ...fields]);
  const lineNumbers = [
    "lines[0].quantity",
    "lines[0].unitCost",
    "lines[0].marginPct",
    "lines[0].discountPct",
    "lines[0].taxRatePct",
    "marginPct",
    "discountPct",
    "taxRatePct",
    "depositPct",
  ];
  BAD_NUMBERS.forEach((value, k) => {
    const name = lineNumbers[k % lineNumbers.length];
    // A blank line percentage means "the quote's figure": not a bad input.
    if (value === "" && name.startsWith("lines[0].") && name.endsWith("Pct")) return;
    cases.push(save(`${name} = ${JSON.stringify(value.slice(0, 20))}`, withField(editor, name, value)));
  });
  cases.push(save("quantity -1", withField(editor, "lines[0].quantity", "-1")));
  cases.push(save("quantity 0", withField(editor, "lines[0].quantity", "0")));
  cases.push(save("quantity 1.0001", withField(editor, "lines[0].quantity", "1.0001")));
  cases.push(save("quantity of 13 digits", withField(editor, "lines[0].quantity", "1234567890123")));
  cases.push(save("unit cost 1e3", withField(editor, "lines[0].unitCost", "1e3")));
  cases.push(save("margin 1000.001 %", withField(editor, "marginPct", "1000.001")));
  cases.push(save("discount 101 %", withField(editor, "discountPct", "101")));
  cases.push(save("deposit 0 %", withField(editor, "depositPct", "0")));
  cases.push(save("line kind 'gift'", withField(editor, "lines[0].kind", "gift")));
  cases.push(save("line part id with SQL", [...editor, ["lines[0].partId", ODD_TEXT.sql]]));
  cases.push(save("no lines", without(editor, "lines[0].kind", "lines[0].description", "lines[0].quantity", "lines[0].unitCost")));
  cases.push(
    save("201 lines", [
      ...editor,
      ...Array.from({ length: 200 }, (_, i) => toFields({ kind: "extra", description: "More", quantity: "1", unitCost: "1" }, `lines[${i + 1}]`)).flat(),
    ]),
  );
  cases.push(save("line index 4294967295", [...editor, ["lines[4294967295].description", "far away"]]));
  cases.push(save("line index 99999999", [...editor, ["lines[99999999].description", "far away"]]));
  cases.push(save("valid until 2027-02-30", withField(editor, "validUntil", "2027-02-30")));
  cases.push(save("customer e-mail not an address", withField(editor, "customerEmail", "customer at example")));
  cases.push(save("terms of 10 MB", withField(editor, "terms", filler(10 * MEGABYTE))));
  for (const [key, text] of Object.entries(ODD_TEXT))
    cases.push(save(`title ${key}, quantity NaN`, withField(withField(editor, "title", text), "lines[0].quantity", "NaN")));
  cases.push(save("title with NUL (otherwise valid)", withField(editor, "title", ODD_TEXT.nul)));
  cases.push(save("line description with NUL (otherwise valid)", withField(editor, "lines[0].description", `Labour ${ODD_TEXT.nul}`)));
  cases.push(save("sent quote: customer name with NUL (otherwise valid)", withField(editor, "customerName", ODD_TEXT.nul), ids.sentQuoteId));

  const act = (label: string, quoteId: string, fields: FormFields) => postForm(family, "installer", `/quotes/${quoteId}`, label, fields);
  cases.push(act("no intent", ids.draftQuoteId, editor));
  cases.push(act("intent 'approve' from the installer", ids.sentQuoteId, [["intent", "approve"]]));
  cases.push(
    act("withdraw a draft, reason with NUL", ids.draftQuoteId, [
      ["intent", "withdraw"],
      ["reason", ODD_TEXT.nul],
    ]),
  );
  cases.push(
    act("withdraw a draft, reason of 10 MB", ids.draftQuoteId, [
      ["intent", "withdraw"],
      ["reason", filler(10 * MEGABYTE)],
    ]),
  );
  for (const { id } of badIdPaths((id) => id)) {
    cases.push(act(`send quote ${id.slice(0, 20)}`, id, [["intent", "send"]]));
    cases.push(
      act(`withdraw quote ${id.slice(0, 20)}`, id, [
        ["intent", "withdraw"],
        ["reason", "changed my mind"],
      ]),
    );
  }
  cases.push(act("save on a bad id", "not-a-uuid", [["intent", "save"], ...editor]));

  const customer = (label: string, quoteId: string, fields: FormFields) => postForm("my quotes", "customer", `/my-quotes/${quoteId}`, label, fields);
  const mine = ids.sentQuoteId;
  cases.push(
    customer("approve without ticking the box", mine, [
      ["intent", "approve"],
      ["acceptedName", "Hostile Customer"],
    ]),
  );
  cases.push(
    customer("approve with box value 'yes'", mine, [
      ["intent", "approve"],
      ["acceptedName", "Hostile Customer"],
      ["confirm", "yes"],
    ]),
  );
  cases.push(
    customer("approve with an empty name", mine, [
      ["intent", "approve"],
      ["acceptedName", " "],
      ["confirm", "on"],
    ]),
  );
  cases.push(
    customer("approve with a name of 10 MB", mine, [
      ["intent", "approve"],
      ["acceptedName", filler(10 * MEGABYTE)],
      ["confirm", "on"],
    ]),
  );
  cases.push(
    customer("approve with a NUL name (otherwise valid)", mine, [
      ["intent", "approve"],
      ["acceptedName", ODD_TEXT.onlyNuls],
      ["confirm", "on"],
    ]),
  );
  cases.push(customer("decline without a comment", mine, [["intent", "decline"]]));
  cases.push(
    customer("decline with 'no'", mine, [
      ["intent", "decline"],
      ["comment", "no"],
    ]),
  );
  cases.push(
    customer("decline with a comment of 2001 characters", mine, [
      ["intent", "decline"],
      ["comment", "c".repeat(2001)],
    ]),
  );
  cases.push(
    customer("decline with a NUL comment (otherwise valid)", mine, [
      ["intent", "decline"],
      ["comment", `Too dear ${ODD_TEXT.nul} for us.`],
    ]),
  );
  cases.push(customer("pay before approving", mine, [["intent", "pay"]]));
  cases.push(customer("unknown intent", mine, [["intent", "refund"]]));
  cases.push(customer("no intent", mine, []));
  cases.push(
    customer("approve a draft quote of another team's customer", ids.draftQuoteId, [
      ["intent", "approve"],
      ["acceptedName", "Hostile Customer"],
      ["confirm", "on"],
    ]),
  );
  for (const { id } of badIdPaths((id) => id)) {
    cases.push(customer(`pay quote ${id.slice(0, 20)}`, id, [["intent", "pay"]]));
    cases.push(
      customer(`decline quote ${id.slice(0, 20)}`, id, [
        ["intent", "decline"],
        ["comment", "Not what we asked for."],
      ]),
    );
  }
  for (const { id } of badIdPaths((id) => id).slice(0, 4)) cases.push(get(family, "installer", `/quotes/${id}/print`, `print quote ${id.slice(0, 20)}`));
  return cases;
}
