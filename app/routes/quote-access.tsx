import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect, useNavigation } from "react-router";
import type { Route } from "./+types/quote-access";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { firstPasswordSchema } from "~/lib/quote-forms";
import { auth } from "~/server/auth.server";
import { db } from "~/server/db.server";
import { getSessionUser } from "~/server/guards.server";
import { hashAccessToken, hasPassword, setFirstPassword } from "~/server/quotes/customer-account.server";

export const meta: Route.MetaFunction = () => [{ title: "Your quote · Kitwright" }];

// The link in the quote e-mail. It never shows the quote by itself: it lets a new customer choose a
// password (proving they read that mailbox), and sends everyone else to sign in.
async function findByToken(token: string) {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return undefined;
  return db
    .selectFrom("quote")
    .innerJoin("user", "user.id", "quote.customer_user_id")
    .innerJoin("organization", "organization.id", "quote.team_id")
    .select(["quote.id", "quote.customer_user_id", "user.email", "user.name", "organization.name as teamName"])
    .where("quote.access_token_hash", "=", hashAccessToken(token))
    .where("quote.status", "not in", ["draft", "withdrawn"])
    .executeTakeFirst();
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const found = await findByToken(params.token);
  if (!found) return { state: "stale" as const };
  const target = `/my-quotes/${found.id}`;
  const user = await getSessionUser(request);
  if (user?.id === found.customer_user_id) throw redirect(target);
  if (user) return { state: "other-account" as const, signedInAs: user.email, sentTo: found.email };
  if (await hasPassword(found.customer_user_id!)) throw redirect(`/sign-in?redirectTo=${encodeURIComponent(target)}`);
  return { state: "choose-password" as const, email: found.email, teamName: found.teamName };
}

export async function action({ request, params }: Route.ActionArgs) {
  const found = await findByToken(params.token);
  if (!found) return data({ result: null }, { status: 404 });
  const submission = parseWithZod(await request.formData(), { schema: firstPasswordSchema });
  if (submission.status !== "success") return data({ result: submission.reply({ hideFields: ["password", "confirmPassword"] }) }, { status: 400 });
  const set = await setFirstPassword(found.customer_user_id!, submission.value.password);
  const target = `/my-quotes/${found.id}`;
  if (!set) throw redirect(`/sign-in?redirectTo=${encodeURIComponent(target)}`);
  const { headers } = await auth.api.signInEmail({
    body: { email: found.email, password: submission.value.password },
    headers: request.headers,
    returnHeaders: true,
  });
  throw redirect(target, { headers });
}

export default function QuoteAccess({ loaderData, actionData }: Route.ComponentProps) {
  const busy = useNavigation().state === "submitting";
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(firstPasswordSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: firstPasswordSchema }),
    shouldValidate: "onBlur",
  });
  if (loaderData.state === "stale") {
    return (
      <Panel title="This link no longer opens a quote">
        <p>A newer e-mail may have replaced it, or the installer withdrew the quote.</p>
        <p className="mt-2">
          <Link to="/my-quotes" className="underline">
            Sign in to see your quotes
          </Link>
        </p>
      </Panel>
    );
  }
  if (loaderData.state === "other-account") {
    return (
      <Panel title="This quote was sent to someone else">
        <p>
          You are signed in as {loaderData.signedInAs}, but this quote was sent to {loaderData.sentTo}. Sign out, then open the link from the e-mail again.
        </p>
        <Form method="post" action="/sign-out" className="mt-3">
          <button type="submit" className="rounded-md border border-copper px-4 py-2 font-medium text-copper-dark">
            Sign out
          </button>
        </Form>
      </Panel>
    );
  }
  return (
    <div className="mx-auto max-w-md">
      <PageHeader
        title="Choose a password"
        lead={`${loaderData.teamName} sent you a quote. Choose a password for ${loaderData.email}, so that only you can open, approve and pay it.`}
      />
      <Panel>
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <FormErrors errors={form.errors} />
          <TextField field={fields.password} label="Password (at least 10 characters)" type="password" autoComplete="new-password" />
          <TextField field={fields.confirmPassword} label="The same password again" type="password" autoComplete="new-password" />
          <SubmitButton pending={busy}>Save password and open the quote</SubmitButton>
        </Form>
      </Panel>
    </div>
  );
}
