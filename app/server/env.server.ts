// Environment, validated once at boot. Every variable is listed in .env.example with a safe local
// default; production must set the secrets explicitly (see README, "Running more than one instance").
// The schema lives in env-schema.ts, free of side effects, so that tests and scripts can use it.
import { parseEnv } from "./env-schema";

export { parseEnv, type Env } from "./env-schema";

export const env = parseEnv(process.env);
