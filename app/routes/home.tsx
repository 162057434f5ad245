import { Link } from "react-router";
import type { Route } from "./+types/home";
import { BrandMark } from "~/components/brand-mark";
import { PageHeader } from "~/components/page-header";
import { navFor } from "~/lib/nav";
import { findMembership, getSessionUser } from "~/server/guards.server";

export const meta: Route.MetaFunction = () => [{ title: "Kitwright — off-grid solar kits, priced on evidence" }];

export async function loader({ request }: Route.LoaderArgs) {
  const user = await getSessionUser(request);
  if (!user) return { user: null, teamName: null, needsTeam: false };
  const team = user.role === "installer" ? await findMembership(user.id) : null;
  return { user: { name: user.name, role: user.role }, teamName: team?.teamName ?? null, needsTeam: user.role === "installer" && !team };
}

const SECTION_TEXT: Record<string, string> = {
  "/catalogue": "Modules, batteries, controllers and inverters; nameplate against verified watts from field readings.",
  "/yield": "Energy per module per month at a site, from latitude, tilt, azimuth and the monthly climate.",
  "/quotes": "Quotes from kit plans at your offers' prices; sent, approved and paid by card.",
  "/my-quotes": "The quotes installers have sent you: read, approve or decline, pay the deposit.",
  "/team": "Members, invitations and API keys for integrations.",
  "/admin/users": "Every account and its role.",
};

export default function Home({ loaderData }: Route.ComponentProps) {
  if (!loaderData.user) return <Landing />;
  const { user, teamName, needsTeam } = loaderData;
  return (
    <>
      <PageHeader title={`Good to see you, ${user.name.split(" ")[0]}`} lead={teamName ? `Working as ${teamName}.` : undefined} />
      {needsTeam ? (
        <p className="mb-6 rounded-lg border border-copper bg-copper-wash p-4">
          ➜ Your account has no team yet.{" "}
          <Link to="/team/new" className="font-medium underline">
            Name your team
          </Link>{" "}
          or open the invitation link a colleague sent you.
        </p>
      ) : null}
      {user.role === "customer" ? <p className="mb-4 text-ink-soft">Quotes your installer sends you are listed under “Your quotes”.</p> : null}
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {navFor(user.role).map((item) => (
          <Link key={item.to} to={item.to} className="rounded-xl border border-rule bg-sheet p-5 shadow-sm hover:border-copper">
            <h2 className="font-semibold">{item.label} →</h2>
            <p className="mt-1 text-sm text-ink-soft">{SECTION_TEXT[item.to]}</p>
          </Link>
        ))}
      </div>
    </>
  );
}

function Landing() {
  return (
    <div className="mx-auto max-w-3xl py-10">
      <div className="flex items-center gap-3">
        <BrandMark size={48} />
        <h1 className="text-4xl font-semibold tracking-tight">Kitwright</h1>
      </div>
      <p className="mt-6 text-xl text-ink-soft">
        Price off-grid solar kits on evidence. A shared module catalogue with field readings normalised to standard test conditions, a planner that sizes the
        kit for the worst month at the customer's site, a comparison of your suppliers' offers on cost per verified watt, and quotes your customers approve and
        pay a deposit on.
      </p>
      <div className="mt-8 flex gap-3">
        <Link to="/sign-up" className="rounded-md bg-copper px-5 py-2.5 font-medium text-sheet hover:bg-copper-dark">
          Create an installer account
        </Link>
        <Link to="/sign-in" className="rounded-md border border-rule px-5 py-2.5 hover:bg-paper-deep">
          Sign in
        </Link>
      </div>
      <p className="mt-10 border-t border-rule pt-4 text-sm text-ink-faint">
        Kitwright helps you plan; it does not replace a licensed installer or your local electrical code.
      </p>
    </div>
  );
}
