import { z } from "zod";

export const overrideSchema = z.object({
  intent: z.literal("override"),
  checkId: z.string().min(1).max(100),
  reason: z.string({ error: "Say why this failing safety check is accepted." }).trim().min(10, "Say why in a sentence (at least 10 characters).").max(1000),
});
