// One Conform form per part kind, validated in the browser with the same schema the server uses.
import { useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import type { z } from "zod";

export function usePartForm<S extends z.ZodObject | z.ZodPipe | z.ZodType>(
  schema: S,
  lastResult: SubmissionResult<string[]> | null | undefined,
  defaultValue: Record<string, string>,
) {
  return useForm({
    lastResult,
    defaultValue,
    constraint: getZodConstraint(schema),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema }),
  });
}

export interface PartFormProps {
  lastResult: SubmissionResult<string[]> | null | undefined;
  defaultValue: Record<string, string>;
  pending: boolean;
  submitLabel: string;
}
