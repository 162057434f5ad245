// One JSON line per payments problem, in the same shape as the server's request log, so an operator
// can find a webhook or a Checkout failure by its ids.
export function logPayments(level: "error" | "warn" | "info", msg: string, fields: Record<string, unknown> = {}) {
  const line = JSON.stringify({ time: new Date().toISOString(), level, msg, ...fields });
  if (level === "info") console.log(line);
  else console.error(line);
}

export function errorText(error: unknown) {
  return error instanceof Error ? error.message : String(error);
}
