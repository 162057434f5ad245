import { type RouteConfig, index, prefix, route } from "@react-router/dev/routes";

export default [
  index("routes/home.tsx"),
  route("sign-in", "routes/sign-in.tsx"),
  route("sign-up", "routes/sign-up.tsx"),
  route("sign-out", "routes/sign-out.ts"),
  route("forgot-password", "routes/forgot-password.tsx"),
  route("reset-password", "routes/reset-password.tsx"),
  route("invitations/:invitationId", "routes/invitation.tsx"),
  route("team/new", "routes/team-new.tsx"),
  route("team", "routes/team.tsx"),
  route("team/api-keys", "routes/team-api-keys.tsx"),
  route("admin/users", "routes/admin-users.tsx"),
  route("yield", "routes/yield.tsx"),
  // — catalogue (issue 4) —
  // — field readings and review (issue 4) —
  // — sites, load sheets and kit plans (issue 5) —
  route("sites", "routes/sites.tsx"),
  route("sites/new", "routes/sites-new.tsx"),
  route("sites/:siteId", "routes/site.tsx"),
  route("sites/:siteId/loads/new", "routes/load-sheet-new.tsx"),
  route("sites/:siteId/loads/:loadSheetId", "routes/load-sheet.tsx"),
  route("plans", "routes/plans.tsx"),
  route("plans/new", "routes/plans-new.tsx"),
  route("plans/:planId", "routes/plan.tsx"),
  route("dev/outbox", "routes/dev-outbox.tsx"),
  route("healthz", "routes/healthz.ts"),
  route("readyz", "routes/readyz.ts"),
  route("api/auth/*", "routes/api.auth.$.ts"),
  ...prefix("api/v1", [
    route("me", "routes/api.v1.me.ts"),
    route("yield", "routes/api.v1.yield.ts"),
    route("modules", "routes/api.v1.modules.ts"),
    // — API: catalogue and readings (issue 4) —
    // — API: sites and plans (issue 5) —
    route("sites", "routes/api.v1.sites.ts"),
    route("sites/:siteId", "routes/api.v1.site.ts"),
    route("plans", "routes/api.v1.plans.ts"),
    route("plans/preview", "routes/api.v1.plans-preview.ts"),
    route("plans/:planId", "routes/api.v1.plan.ts"),
    route("*", "routes/api.v1.not-found.ts"),
  ]),
  route("*", "routes/not-found.tsx"),
] satisfies RouteConfig;
