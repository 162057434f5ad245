import { z } from "zod";

export const apiKeyActionSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("create"), name: z.string({ error: "Name the key after what uses it." }).trim().min(2, "Use at least 2 characters.").max(60) }),
  z.object({ intent: z.literal("revoke"), keyId: z.uuid("Unknown key.") }),
]);
