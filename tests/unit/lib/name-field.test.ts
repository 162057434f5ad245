// Names must show something: spaces, zero-width characters or punctuation alone are refused.
import { describe, expect, it } from "vitest";
import { nameField } from "~/lib/name-field";
import { siteFormSchema } from "~/lib/site-forms";

describe("nameField", () => {
  const name = nameField("Name it.");
  it("accepts a name with a letter or digit, trimmed", () => {
    expect(name.parse("  Hut 7 ")).toBe("Hut 7");
    expect(name.parse("Ørsted-Hütte")).toBe("Ørsted-Hütte");
  });
  it("refuses zero-width characters, spaces and punctuation alone", () => {
    for (const bad of ["\u200b\u200b\u200b", "\u200d\u2060\ufeff", "---", "  ", "\u202e\u202e"]) expect(name.safeParse(bad).success).toBe(false);
  });
  it("is what the site form uses", () => {
    const result = siteFormSchema.safeParse({ name: "\u200b\u200b" });
    expect(result.success).toBe(false);
    expect(result.error!.issues.find((i) => i.path[0] === "name")?.message).toBe("Use at least one letter or digit.");
  });
});
