import { z } from "zod";
import { inviteSchema } from "./auth-forms";

export const teamActionSchema = z.discriminatedUnion("intent", [
  inviteSchema,
  z.object({ intent: z.literal("cancel-invitation"), invitationId: z.string().min(1).max(100) }),
  z.object({ intent: z.literal("remove-member"), memberId: z.string().min(1).max(100) }),
]);
