// Tables that protect the service itself (migrations/2026-12-02T0500-rate-limits.ts).
import type { ColumnType } from "kysely";

type Timestamp = ColumnType<Date, Date | string, Date | string>;

/** One fixed window of attempts per bucket (sign-in or password reset, by account or by address). */
export interface AuthAttemptLimitTable {
  bucket: string;
  hits: number;
  window_started_at: Timestamp;
}

/** better-auth's built-in limiter for /api/auth/* (storage "database"); written by better-auth only. */
export interface BetterAuthRateLimitTable {
  id: string;
  key: string;
  count: number;
  lastRequest: ColumnType<number, number, number>;
}

export interface SecurityTables {
  auth_attempt_limit: AuthAttemptLimitTable;
  rateLimit: BetterAuthRateLimitTable;
}
