import { data, isRouteErrorResponse, Links, Meta, Outlet, Scripts, ScrollRestoration, useRouteLoaderData } from "react-router";
import type { ReactNode } from "react";
import type { Route } from "./+types/root";
import stylesheet from "./app.css?url";
import { AppShell, type ShellUser } from "./components/app-shell";
import { ErrorPage } from "./components/error-page";
import { FlashBanner } from "./components/flash-banner";
import { env } from "./server/env.server";
import { readFlash } from "./server/flash.server";
import { findMembership, getSessionUser } from "./server/guards.server";
import { skipAfterPreview } from "~/lib/preview-revalidation";

export const shouldRevalidate = skipAfterPreview;

export const links: Route.LinksFunction = () => [
  { rel: "stylesheet", href: stylesheet },
  { rel: "icon", href: "/favicon.svg", type: "image/svg+xml" },
];

export const meta: Route.MetaFunction = () => [{ title: "Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const user = await getSessionUser(request);
  const team = user?.role === "installer" ? await findMembership(user.id) : null;
  const { flash, headers } = await readFlash(request);
  const shellUser: ShellUser | null = user ? { name: user.name, email: user.email, role: user.role, teamName: team?.teamName ?? null } : null;
  return data({ user: shellUser, flash, devOutbox: env.ENABLE_DEV_OUTBOX }, { headers });
}

export function Layout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <Meta />
        <Links />
      </head>
      <body className="font-sans antialiased">
        {children}
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App({ loaderData }: Route.ComponentProps) {
  return (
    <AppShell user={loaderData.user} devOutbox={loaderData.devOutbox}>
      {loaderData.flash ? <FlashBanner flash={loaderData.flash} /> : null}
      <Outlet />
    </AppShell>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  const rootData = useRouteLoaderData<typeof loader>("root");
  if (!isRouteErrorResponse(error)) console.error(error);
  return (
    <AppShell user={rootData?.user ?? null} devOutbox={rootData?.devOutbox ?? false}>
      <ErrorPage error={error} />
    </AppShell>
  );
}
