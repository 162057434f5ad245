import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect, useNavigation, useSearchParams } from "react-router";
import type { Route } from "./+types/sign-up";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { Panel } from "~/components/page-header";
import { safeRedirect, signUpSchema } from "~/lib/auth-forms";
import { auth } from "~/server/auth.server";
import { authErrorMessage } from "~/server/auth-errors.server";
import { getSessionUser } from "~/server/guards.server";

export const meta: Route.MetaFunction = () => [{ title: "Create an account · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  if (await getSessionUser(request)) throw redirect("/");
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  const submission = parseWithZod(await request.formData(), { schema: signUpSchema });
  if (submission.status !== "success") return data({ result: submission.reply({ hideFields: ["password"] }) }, { status: 400 });
  const { name, email, password, redirectTo } = submission.value;
  try {
    // autoSignIn: the new installer is signed in at once (the response carries the session cookie).
    const { headers } = await auth.api.signUpEmail({ body: { name, email, password }, headers: request.headers, returnHeaders: true });
    return redirect(safeRedirect(redirectTo, "/team/new"), { headers });
  } catch (error) {
    const message = authErrorMessage(error);
    if (!message) throw error;
    const taken = /exist/i.test(message);
    return data(
      {
        result: submission.reply({
          fieldErrors: taken ? { email: ["An account with this e-mail already exists. Sign in instead."] } : {},
          formErrors: taken ? [] : [message],
          hideFields: ["password"],
        }),
      },
      { status: taken ? 409 : 400 },
    );
  }
}

export default function SignUp({ actionData }: Route.ComponentProps) {
  const [searchParams] = useSearchParams();
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData?.result,
    constraint: getZodConstraint(signUpSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signUpSchema }),
    shouldRevalidate: "onBlur",
  });
  const redirectTo = searchParams.get("redirectTo") ?? "";
  return (
    <div className="mx-auto max-w-md">
      <Panel title="Create an installer account">
        <p className="mb-4 text-sm text-ink-soft">
          You will name your team next, then invite colleagues. Joining a team by invitation? Use the e-mail address the invitation was sent to.
        </p>
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <input type="hidden" name="redirectTo" value={redirectTo} />
          <FormErrors errors={form.errors} />
          <TextField field={fields.name} label="Your name" autoComplete="name" />
          <TextField field={fields.email} label="E-mail" type="email" autoComplete="email" />
          <TextField field={fields.password} label="Password" type="password" autoComplete="new-password" hint="At least 10 characters." />
          <SubmitButton pending={navigation.state === "submitting"}>Create account</SubmitButton>
        </Form>
        <p className="mt-6 border-t border-rule pt-4 text-sm text-ink-soft">
          Already have an account?{" "}
          <Link to={`/sign-in${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ""}`} className="font-medium text-copper underline">
            Sign in
          </Link>
        </p>
      </Panel>
    </div>
  );
}
