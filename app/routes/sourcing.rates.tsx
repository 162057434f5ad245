// The team's quoting currency and its own exchange rates, each with the day it was taken. Offers in
// other currencies are converted with the newest rate dated on or before the comparison's day.
import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { data, Form, useNavigation } from "react-router";
import type { Route } from "./+types/sourcing.rates";
import { FormErrors, SubmitButton, TextField } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { SourcingTabs } from "~/components/sourcing/sourcing-tabs";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { ratesActionSchema } from "~/lib/sourcing-forms";
import { db } from "~/server/db.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { deleteRate, getQuotingCurrency, listRates, saveRate, setQuotingCurrency } from "~/server/sourcing/settings.server";

export const meta: Route.MetaFunction = () => [{ title: "Currency and rates · Sourcing · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const [quoting, rates] = await Promise.all([getQuotingCurrency(db, team.teamId), listRates(db, team.teamId)]);
  return { quoting, rates, today: todayIso() };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  const formData = await request.formData();
  const submission = parseWithZod(formData, { schema: ratesActionSchema });
  const intent = String(formData.get("intent") ?? "");
  if (submission.status !== "success") return data({ intent, result: submission.reply() }, { status: 400 });
  const value = submission.value;
  if (value.intent === "currency") {
    await setQuotingCurrency(db, team.teamId, value.quotingCurrency);
    return redirectWithFlash("/sourcing/rates", { kind: "success", message: `Comparisons are now in ${value.quotingCurrency}.` });
  }
  if (value.intent === "add-rate") {
    await saveRate(db, team.teamId, user.id, value);
    return redirectWithFlash("/sourcing/rates", {
      kind: "success",
      message: `Rate saved: 1 ${value.fromCurrency} = ${value.rate} ${value.toCurrency} on ${value.asOf}.`,
    });
  }
  if (!(await deleteRate(db, team.teamId, value.rateId))) throw new Response("No such rate in your team.", { status: 404 });
  return redirectWithFlash("/sourcing/rates", { kind: "info", message: "Rate deleted." });
}

function CurrencyForm({ current, lastResult }: { current: string; lastResult?: SubmissionResult<string[]> }) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    id: "currency",
    lastResult,
    defaultValue: { quotingCurrency: current },
    constraint: getZodConstraint(ratesActionSchema),
    shouldValidate: "onBlur",
  });
  return (
    <Form method="post" {...getFormProps(form)} className="flex flex-wrap items-end gap-3">
      <input type="hidden" name="intent" value="currency" />
      <div className="w-40">
        <TextField field={fields.quotingCurrency} label="Quoting currency" />
      </div>
      <SubmitButton pending={navigation.state === "submitting"}>Use this currency</SubmitButton>
    </Form>
  );
}

function RateForm({ quoting, today, lastResult }: { quoting: string; today: string; lastResult?: SubmissionResult<string[]> }) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    id: "add-rate",
    lastResult,
    defaultValue: { toCurrency: quoting, asOf: today },
    onValidate: ({ formData }) => parseWithZod(formData, { schema: ratesActionSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-3">
      <FormErrors errors={form.errors} />
      <input type="hidden" name="intent" value="add-rate" />
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
        <TextField field={fields.fromCurrency} label="1 unit of" hint="e.g. GBP" />
        <TextField field={fields.rate} label="buys" hint="e.g. 1.1725" />
        <TextField field={fields.toCurrency} label="of" />
        <TextField field={fields.asOf} label="taken on" hint="YYYY-MM-DD" />
      </div>
      <SubmitButton pending={navigation.state === "submitting"}>Save rate</SubmitButton>
    </Form>
  );
}

export default function Rates({ loaderData, actionData }: Route.ComponentProps) {
  const { quoting, rates, today } = loaderData;
  return (
    <>
      <PageHeader
        title="Currency and rates"
        lead="Comparisons and landed costs are shown in your quoting currency. You enter the rates yourself, with the day you took them; each converted figure names the rate it used."
      />
      <SourcingTabs />
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Quoting currency">
          <p className="mb-3 text-sm text-ink-soft">
            Now: <strong>{quoting.currency}</strong>
            {quoting.chosen ? "" : " (the default; choose your own)"}.
          </p>
          <CurrencyForm current={quoting.currency} lastResult={actionData?.intent === "currency" ? actionData.result : undefined} />
        </Panel>
        <Panel title="Add a rate">
          <RateForm quoting={quoting.currency} today={today} lastResult={actionData?.intent === "add-rate" ? actionData.result : undefined} />
          <p className="mt-2 text-xs text-ink-faint">
            A rate entered one way also converts the other way (1 ÷ rate). A new rate for the same pair and day replaces the old one.
          </p>
        </Panel>
      </div>
      <div className="mt-6">
        <Panel title="Your rates">
          {rates.length === 0 ? <p className="text-ink-soft">No rates yet: offers in other currencies cannot be compared until you add one.</p> : null}
          <table className="figures w-full text-left text-sm" data-testid="rates">
            <tbody className="divide-y divide-rule">
              {rates.map((r) => (
                <tr key={r.id}>
                  <td className="py-2">
                    1 {r.from} = {r.rate} {r.to}
                  </td>
                  <td className="py-2 text-ink-soft">taken on {r.asOf}</td>
                  <td className="py-2 text-right">
                    <Form method="post">
                      <input type="hidden" name="intent" value="delete-rate" />
                      <input type="hidden" name="rateId" value={r.id} />
                      <button type="submit" className="text-xs text-fail underline">
                        Delete
                      </button>
                    </Form>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </Panel>
      </div>
    </>
  );
}
