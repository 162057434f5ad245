// The production server's settings (scripts/serve.ts), validated with the app's own schema before
// the build is loaded, so that a typo stops the boot with a message instead of being ignored.
import { z } from "zod";
import { envProblems, envSchema, InvalidEnvironment, type EnvSource } from "../../app/server/env-schema";
import { serverBuildPath } from "./build-dir";

// An exported but empty variable (`LOG_LEVEL=`) means "the default", as in .env.example.
const blankIsUnset = (value: unknown) => (value === "" ? undefined : value);

const serverSchema = z.object({
  HOST: z.preprocess(
    blankIsUnset,
    z
      .union([z.ipv4(), z.ipv6(), z.hostname()], { error: "HOST is the address to listen on: 127.0.0.1, 0.0.0.0 (every interface) or a host name" })
      .default("127.0.0.1"),
  ),
  LOG_LEVEL: z.preprocess(
    blankIsUnset,
    z.enum(["info", "warn", "error"], { error: "LOG_LEVEL is info (every request), warn (4xx and 5xx) or error (5xx only)" }).default("info"),
  ),
  TRUST_PROXY: z.preprocess(
    blankIsUnset,
    z
      .string()
      .regex(/^\d{1,2}$/, "TRUST_PROXY is the number of proxies in front of the app: 0 (none), 1, 2…")
      .default("0")
      .transform(Number),
  ),
  SERVER_BUILD: z.preprocess(blankIsUnset, z.string().endsWith(".js", "SERVER_BUILD is the server bundle, e.g. build/server/index.js").optional()),
});

export type ServerEnv = ReturnType<typeof parseServerEnv>;

/** The app's settings plus the server's own, or InvalidEnvironment listing every problem in both. */
export function parseServerEnv(source: EnvSource) {
  const app = envSchema.safeParse(source);
  const server = serverSchema.safeParse(source);
  const problems = [...(app.success ? [] : envProblems(app.error)), ...(server.success ? [] : envProblems(server.error))];
  if (!app.success || !server.success) throw new InvalidEnvironment(problems);
  return { ...app.data, ...server.data, SERVER_BUILD: serverBuildPath(source) };
}
