// Liveness: the process is up and serving.
export function loader() {
  return Response.json({ status: "ok" }, { headers: { "Cache-Control": "no-store" } });
}
