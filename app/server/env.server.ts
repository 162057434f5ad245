// Environment, validated once at boot. Every variable is listed in .env.example with a safe local
// default; production must set the secrets explicitly (see README, "Running more than one instance").
import { z } from "zod";

const bool = z
  .enum(["true", "false", "1", "0", ""])
  .default("false")
  .transform((v) => v === "true" || v === "1");

const schema = z
  .object({
    NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
    PORT: z.coerce.number().int().min(1).max(65535).default(3000),
    PUBLIC_URL: z.url().default("http://127.0.0.1:3000"),
    DATABASE_URL: z.string().startsWith("postgres").default("postgres://postgres@127.0.0.1:54320/kitwright"),
    DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
    BETTER_AUTH_SECRET: z.string().min(32, "BETTER_AUTH_SECRET must be at least 32 characters").default("local-development-secret-change-me-0123456789"),
    SMTP_HOST: z.string().default("127.0.0.1"),
    SMTP_PORT: z.coerce.number().int().default(2525),
    MAIL_FROM: z.string().default("Kitwright <no-reply@kitwright.invalid>"),
    MAIL_FAKE_URL: z.string().default("http://127.0.0.1:2580"),
    ENABLE_DEV_OUTBOX: bool,
    STRIPE_SECRET_KEY: z.string().default("sk_test_local_fake"),
    STRIPE_API_URL: z.string().default("http://127.0.0.1:12111"),
    STRIPE_WEBHOOK_SECRET: z.string().default("whsec_local_fake_secret"),
    UPLOAD_DIR: z.string().default("/var/tmp/kitwright-uploads"),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === "production" && env.BETTER_AUTH_SECRET.startsWith("local-development-secret") && !env.ENABLE_DEV_OUTBOX) {
      ctx.addIssue({ code: "custom", path: ["BETTER_AUTH_SECRET"], message: "set a real secret in production" });
    }
  });

export type Env = z.infer<typeof schema>;

function loadEnv(): Env {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  return parsed.data;
}

export const env = loadEnv();
