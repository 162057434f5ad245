import { Form, Link, NavLink, useLocation } from "react-router";
import { useEffect, useRef, type ReactNode } from "react";
import { BrandMark } from "./brand-mark";
import { navFor } from "~/lib/nav";
import type { Role } from "~/lib/roles";

export interface ShellUser {
  name: string;
  email: string;
  role: Role;
  teamName: string | null;
}

function navClass({ isActive }: { isActive: boolean }) {
  return `whitespace-nowrap rounded-md px-3 py-2 text-sm font-medium ${isActive ? "bg-ink text-paper" : "text-ink-soft hover:bg-paper-deep hover:text-ink"}`;
}

function NavLinks({ user }: { user: ShellUser | null }) {
  return (
    <>
      {navFor(user?.role ?? null).map((item) => (
        <NavLink key={item.to} to={item.to} className={navClass}>
          {item.label}
        </NavLink>
      ))}
    </>
  );
}

// In the header the name and team are capped so that a long one cannot push "Sign out" off the
// line; in the phone menu they stack above the button and wrap instead.
function Account({ user, stacked = false }: { user: ShellUser; stacked?: boolean }) {
  const role = user.teamName ? `${user.role} · ${user.teamName}` : user.role;
  const line = stacked ? "block" : "block truncate";
  return (
    <div className={stacked ? "flex flex-col items-start gap-2 text-sm" : "flex items-center gap-3 text-sm"}>
      <span className={stacked ? "leading-tight" : "max-w-52 min-w-0 text-right leading-tight"} title={stacked ? undefined : `${user.name} · ${role}`}>
        <span className={`${line} font-medium`}>{user.name}</span>
        <span className={`${line} text-xs text-ink-faint`}>{role}</span>
      </span>
      <Form method="post" action="/sign-out">
        <button type="submit" className="rounded-md border border-rule px-3 py-1.5 whitespace-nowrap hover:bg-paper-deep">
          Sign out
        </button>
      </Form>
    </div>
  );
}

export function AppShell({ user, devOutbox, children }: { user: ShellUser | null; devOutbox: boolean; children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="no-print border-b border-rule bg-sheet">
        <div className="mx-auto flex max-w-6xl items-center gap-4 px-4 py-3">
          <Link to="/" className="flex items-center gap-2 font-semibold tracking-tight">
            <BrandMark size={30} />
            <span className="text-lg">Kitwright</span>
          </Link>
          <nav aria-label="Main" className="hidden flex-1 gap-1 xl:flex">
            <NavLinks user={user} />
          </nav>
          <div className="ml-auto hidden xl:block">{user ? <Account user={user} /> : <SignedOutLinks />}</div>
          <PhoneMenu user={user} />
        </div>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-6">{children}</main>
      <footer className="no-print border-t border-rule py-4 text-center text-xs text-ink-faint">
        Kitwright — off-grid kits, priced on evidence.
        {devOutbox ? (
          <>
            {" · "}
            <Link to="/dev/outbox" className="underline">
              Outbox (local fake)
            </Link>
          </>
        ) : null}
      </footer>
    </div>
  );
}

// The collapsed menu below the width where the full navigation fits on one line. A <details> keeps
// itself open through a client-side navigation, so it is closed whenever the location changes.
function PhoneMenu({ user }: { user: ShellUser | null }) {
  const menu = useRef<HTMLDetailsElement>(null);
  const location = useLocation();
  useEffect(() => {
    if (menu.current) menu.current.open = false;
  }, [location.key]);
  return (
    <details ref={menu} className="relative ml-auto xl:hidden">
      <summary className="cursor-pointer list-none rounded-md border border-rule px-3 py-1.5 text-sm">Menu ☰</summary>
      <div className="absolute right-0 z-20 mt-2 flex w-64 max-w-[calc(100vw-2rem)] flex-col gap-1 rounded-lg border border-rule bg-sheet p-3 shadow-lg">
        <nav aria-label="Main" className="flex flex-col gap-1">
          <NavLinks user={user} />
        </nav>
        <div className="mt-2 border-t border-rule pt-2">{user ? <Account user={user} stacked /> : <SignedOutLinks />}</div>
      </div>
    </details>
  );
}

function SignedOutLinks() {
  return (
    <div className="flex gap-2 text-sm">
      <Link to="/sign-in" className="rounded-md px-3 py-1.5 hover:bg-paper-deep">
        Sign in
      </Link>
      <Link to="/sign-up" className="rounded-md bg-copper px-3 py-1.5 font-medium text-sheet hover:bg-copper-dark">
        Create an account
      </Link>
    </div>
  );
}
