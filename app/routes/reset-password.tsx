import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, useNavigation, useSearchParams } from "react-router";
import type { Route } from "./+types/reset-password";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { resetPasswordSchema } from "~/lib/auth-forms";
import { auth } from "~/server/auth.server";
import { authErrorMessage } from "~/server/auth-errors.server";
import { redirectWithFlash } from "~/server/flash.server";

export const meta: Route.MetaFunction = () => [{ title: "Choose a new password · Kitwright" }];

export async function action({ request }: Route.ActionArgs) {
  const submission = parseWithZod(await request.formData(), { schema: resetPasswordSchema });
  if (submission.status !== "success") return data({ result: submission.reply({ hideFields: ["password", "confirm"] }) }, { status: 400 });
  try {
    await auth.api.resetPassword({ body: { newPassword: submission.value.password, token: submission.value.token } });
  } catch (error) {
    if (!authErrorMessage(error)) throw error;
    return data(
      {
        result: submission.reply({ formErrors: ["This reset link has expired or was already used. Ask for a new one."], hideFields: ["password", "confirm"] }),
      },
      { status: 400 },
    );
  }
  return redirectWithFlash("/sign-in", { kind: "success", message: "Your password is changed. Sign in with the new one." });
}

export default function ResetPassword({ actionData }: Route.ComponentProps) {
  const [searchParams] = useSearchParams();
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(resetPasswordSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: resetPasswordSchema }),
  });
  const token = searchParams.get("token") ?? "";
  return (
    <div className="mx-auto max-w-md">
      <Panel title="Choose a new password">
        {token ? null : <FormErrors errors={["This page needs the link from the reset e-mail."]} />}
        <Form method="post" {...getFormProps(form)} className="mt-2 space-y-4">
          <input type="hidden" name="token" value={token} />
          <FormErrors errors={form.errors} />
          <TextField field={fields.password} label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." />
          <TextField field={fields.confirm} label="The same password again" type="password" autoComplete="new-password" />
          <SubmitButton pending={navigation.state === "submitting"}>Save the new password</SubmitButton>
        </Form>
      </Panel>
    </div>
  );
}
