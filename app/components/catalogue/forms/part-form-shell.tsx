// The frame every part form shares: the form element, form-level errors and the save button.
import { getFormProps, type FormMetadata } from "@conform-to/react";
import type { ReactNode } from "react";
import { Form } from "react-router";
import { FormErrors, SubmitButton } from "~/components/form-field";

export function PartFormShell({
  form,
  children,
  pending,
  submitLabel,
}: {
  form: FormMetadata<any, string[]>;
  children: ReactNode;
  pending: boolean;
  submitLabel: string;
}) {
  const fieldErrors = Object.entries(form.allErrors).filter(([name]) => name !== form.name).length;
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-5">
      <FormErrors errors={form.errors} />
      {fieldErrors > 0 ? (
        <p role="alert" className="text-sm text-fail">
          <span aria-hidden="true">✕</span> {fieldErrors} field{fieldErrors === 1 ? " needs" : "s need"} attention: see the message under{" "}
          {fieldErrors === 1 ? "it" : "each"}.
        </p>
      ) : null}
      {children}
      <div className="flex items-center gap-3">
        <SubmitButton pending={pending}>{submitLabel}</SubmitButton>
      </div>
    </Form>
  );
}
