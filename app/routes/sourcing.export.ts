// GET /sourcing/export — the team's offers as a CSV file in the import's columns.
import type { Route } from "./+types/sourcing.export";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { db } from "~/server/db.server";
import { requireTeamMember } from "~/server/guards.server";
import { exportOffersCsv } from "~/server/sourcing/offer-export.server";

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const csv = await exportOffersCsv(db, team.teamId);
  return new Response(csv, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="kitwright-offers-${todayIso()}.csv"`,
      "Cache-Control": "private, no-store",
    },
  });
}
