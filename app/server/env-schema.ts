// The environment's shape, with no side effects: env.server.ts validates process.env with it at boot,
// scripts/serve.ts before it loads the build, and the unit tests with values of their own.
import { z } from "zod";

export const DEFAULT_AUTH_SECRET = "local-development-secret-change-me-0123456789";

const bool = z
  .enum(["true", "false", "1", "0", ""])
  .default("false")
  .transform((v) => v === "true" || v === "1");

export const envSchema = z
  .object({
    NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
    PORT: z.coerce.number().int().min(1).max(65535).default(3000),
    PUBLIC_URL: z.url().default("http://127.0.0.1:3000"),
    DATABASE_URL: z.string().startsWith("postgres").default("postgres://postgres@127.0.0.1:54320/kitwright"),
    DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
    BETTER_AUTH_SECRET: z.string().min(32, "BETTER_AUTH_SECRET must be at least 32 characters").default(DEFAULT_AUTH_SECRET),
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
    // `npm start` runs in production mode on the local default secret; it is recognisable by its
    // development outbox, which no real deployment turns on.
    if (env.NODE_ENV === "production" && env.BETTER_AUTH_SECRET.startsWith("local-development-secret") && !env.ENABLE_DEV_OUTBOX) {
      ctx.addIssue({ code: "custom", path: ["BETTER_AUTH_SECRET"], message: "set a real secret in production" });
    }
  });

export type Env = z.infer<typeof envSchema>;
export type EnvSource = Record<string, string | undefined>;

/** One line per problem, "  NAME: message", for a message a person reads at boot. */
export function envProblems(error: z.ZodError): string[] {
  return error.issues.map((i) => `  ${i.path.join(".") || "(environment)"}: ${i.message}`);
}

export class InvalidEnvironment extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid environment:\n${problems.join("\n")}`);
    this.name = "InvalidEnvironment";
  }
}

/** The app's settings from `source` (process.env at boot), or InvalidEnvironment listing every problem. */
export function parseEnv(source: EnvSource): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) throw new InvalidEnvironment(envProblems(parsed.error));
  return parsed.data;
}
