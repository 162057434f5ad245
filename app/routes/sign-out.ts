import { redirect } from "react-router";
import type { Route } from "./+types/sign-out";
import { auth } from "~/server/auth.server";
import { redirectWithFlash } from "~/server/flash.server";

export async function loader() {
  throw redirect("/");
}

export async function action({ request }: Route.ActionArgs) {
  // Signing out without a session is not an error: the user ends up signed out either way.
  const headers = await auth.api
    .signOut({ headers: request.headers, returnHeaders: true })
    .then((r) => r.headers)
    .catch(() => new Headers());
  return redirectWithFlash("/", { kind: "info", message: "You are signed out." }, { headers });
}
