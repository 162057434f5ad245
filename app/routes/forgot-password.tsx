import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, useNavigation } from "react-router";
import type { Route } from "./+types/forgot-password";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { forgotPasswordSchema } from "~/lib/auth-forms";
import { auth } from "~/server/auth.server";
import { gatePasswordReset } from "~/server/auth-attempts.server";
import { redirectWithFlash } from "~/server/flash.server";

export const meta: Route.MetaFunction = () => [{ title: "Reset your password · Kitwright" }];

// A refused request says when to come back (the action's Retry-After reaches the page's response).
export function headers({ actionHeaders }: Route.HeadersArgs) {
  const retryAfter = actionHeaders.get("Retry-After");
  return retryAfter ? { "Retry-After": retryAfter } : new Headers();
}

export async function action({ request }: Route.ActionArgs) {
  const submission = parseWithZod(await request.formData(), { schema: forgotPasswordSchema });
  if (submission.status !== "success") return data({ result: submission.reply() }, { status: 400 });
  // Counted per typed address whether or not it has an account, so a refusal reveals no accounts.
  const gate = await gatePasswordReset(request, submission.value.email);
  if (!gate.allowed) {
    return data({ result: submission.reply({ formErrors: [gate.message] }) }, { status: 429, headers: { "Retry-After": String(gate.retryAfterSeconds) } });
  }
  // The answer is the same whether or not the address has an account, so the form reveals no accounts.
  await auth.api.requestPasswordReset({ body: { email: submission.value.email, redirectTo: "/reset-password" }, headers: request.headers });
  return redirectWithFlash("/sign-in", {
    kind: "info",
    message: `If ${submission.value.email} has a Kitwright account, a link to choose a new password is on its way. It works for one hour.`,
  });
}

export default function ForgotPassword({ actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(forgotPasswordSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: forgotPasswordSchema }),
  });
  return (
    <div className="mx-auto max-w-md">
      <Panel title="Forgot your password?">
        <p className="mb-4 text-sm text-ink-soft">Enter the e-mail address of your account and we will send you a link to choose a new password.</p>
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <FormErrors errors={form.errors} />
          <TextField field={fields.email} label="E-mail" type="email" autoComplete="email" />
          <SubmitButton pending={navigation.state === "submitting"}>Send the link</SubmitButton>
        </Form>
      </Panel>
    </div>
  );
}
