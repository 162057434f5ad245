// better-auth owns users, passwords, sessions (in PostgreSQL, so several app instances share them),
// global roles (admin plugin) and installer teams with invitations (organization plugin).
import { betterAuth } from "better-auth";
import { admin, organization } from "better-auth/plugins";
import { CLIENT_IP_HEADER } from "./client-ip.server";
import { pool } from "./db.server";
import { env } from "./env.server";
import { sendMail } from "./mail.server";
import { ROLES } from "~/lib/roles";

const secureCookies = env.PUBLIC_URL.startsWith("https://");

export const auth = betterAuth({
  appName: "Kitwright",
  baseURL: env.PUBLIC_URL,
  secret: env.BETTER_AUTH_SECRET,
  database: pool,
  trustedOrigins: [env.PUBLIC_URL],
  emailAndPassword: {
    enabled: true,
    autoSignIn: true,
    minPasswordLength: 10,
    resetPasswordTokenExpiresIn: 60 * 60,
    async sendResetPassword({ user, token }) {
      await sendMail({
        to: user.email,
        subject: "Reset your Kitwright password",
        paragraphs: [
          `Hello ${user.name},`,
          "Someone asked to reset the password of your Kitwright account. If it was you, choose a new password within the next hour. If not, ignore this message: your password stays as it is.",
        ],
        action: { label: "Choose a new password", url: `${env.PUBLIC_URL}/reset-password?token=${encodeURIComponent(token)}` },
      });
    },
  },
  session: { expiresIn: 60 * 60 * 24 * 14, updateAge: 60 * 60 * 24 },
  // better-auth's own limiter on /api/auth/*, stored in PostgreSQL so that every instance counts
  // together (its default store is one instance's memory). Sign-in and reset requests get the
  // stricter per-account and per-address limits of auth-attempts.server.ts instead.
  rateLimit: {
    enabled: true,
    storage: "database",
    customRules: { "/sign-in/email": false, "/request-password-reset": false },
  },
  advanced: {
    useSecureCookies: secureCookies,
    // Session cookies: never readable by scripts, not sent on cross-site sub-requests or posts, and
    // only over TLS when the app is served over https.
    defaultCookieAttributes: { httpOnly: true, sameSite: "lax", secure: secureCookies },
    // Only the address scripts/serve.ts sets (after TRUST_PROXY); X-Forwarded-For can be forged.
    ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
  },
  plugins: [
    admin({ defaultRole: ROLES.installer, adminRoles: [ROLES.admin] }),
    organization({
      creatorRole: "owner",
      organizationLimit: 1,
      invitationExpiresIn: 60 * 60 * 24 * 7,
      async sendInvitationEmail({ id, email, organization: team, inviter }) {
        await sendMail({
          to: email,
          subject: `${inviter.user.name} invited you to ${team.name} on Kitwright`,
          paragraphs: [
            `${inviter.user.name} (${inviter.user.email}) invited you to join the team "${team.name}" on Kitwright, where installers plan and price off-grid solar kits together.`,
            "The invitation is valid for seven days.",
          ],
          action: { label: "Join the team", url: `${env.PUBLIC_URL}/invitations/${id}` },
        });
      },
    }),
  ],
});

export type Session = typeof auth.$Infer.Session;
