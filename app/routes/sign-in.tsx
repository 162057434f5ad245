import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect, useNavigation, useSearchParams } from "react-router";
import type { Route } from "./+types/sign-in";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { safeRedirect, signInSchema } from "~/lib/auth-forms";
import { auth } from "~/server/auth.server";
import { authErrorMessage } from "~/server/auth-errors.server";
import { gateSignIn } from "~/server/auth-attempts.server";
import { getSessionUser } from "~/server/guards.server";

export const meta: Route.MetaFunction = () => [{ title: "Sign in · Kitwright" }];

// A refused attempt says when to come back (the action's Retry-After reaches the page's response).
export function headers({ actionHeaders }: Route.HeadersArgs) {
  const retryAfter = actionHeaders.get("Retry-After");
  return retryAfter ? { "Retry-After": retryAfter } : new Headers();
}

export async function loader({ request }: Route.LoaderArgs) {
  if (await getSessionUser(request)) throw redirect("/");
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  const formData = await request.formData();
  const submission = parseWithZod(formData, { schema: signInSchema });
  if (submission.status !== "success") return data({ result: submission.reply({ hideFields: ["password"] }) }, { status: 400 });
  const { email, password, redirectTo } = submission.value;
  const gate = await gateSignIn(request, email);
  if (!gate.allowed) {
    const result = submission.reply({ formErrors: [gate.message], hideFields: ["password"] });
    return data({ result }, { status: 429, headers: { "Retry-After": String(gate.retryAfterSeconds) } });
  }
  try {
    const { headers } = await auth.api.signInEmail({ body: { email, password }, headers: request.headers, returnHeaders: true });
    await gate.succeeded();
    return redirect(safeRedirect(redirectTo), { headers });
  } catch (error) {
    if (!authErrorMessage(error)) throw error;
    return data({ result: submission.reply({ formErrors: ["That e-mail and password do not match an account."], hideFields: ["password"] }) }, { status: 401 });
  }
}

export default function SignIn({ actionData }: Route.ComponentProps) {
  const [searchParams] = useSearchParams();
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(signInSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signInSchema }),
    shouldRevalidate: "onBlur",
  });
  const redirectTo = searchParams.get("redirectTo") ?? "";
  return (
    <div className="mx-auto max-w-md">
      <Panel title="Sign in to Kitwright">
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <input type="hidden" name="redirectTo" value={redirectTo} />
          <FormErrors errors={form.errors} />
          <TextField field={fields.email} label="E-mail" type="email" autoComplete="email" />
          <TextField field={fields.password} label="Password" type="password" autoComplete="current-password" />
          <div className="flex items-center justify-between">
            <SubmitButton pending={navigation.state === "submitting"}>Sign in</SubmitButton>
            <Link to="/forgot-password" className="text-sm underline">
              Forgot your password?
            </Link>
          </div>
        </Form>
        <p className="mt-6 border-t border-rule pt-4 text-sm text-ink-soft">
          New here?{" "}
          <Link to={`/sign-up${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ""}`} className="font-medium text-copper underline">
            Create an installer account
          </Link>
        </p>
      </Panel>
    </div>
  );
}
