// Development-only: every e-mail the app sent to the local fake SMTP server, newest first.
import { Form } from "react-router";
import type { Route } from "./+types/dev-outbox";
import { inputClass } from "~/components/form-field";
import { PageHeader } from "~/components/page-header";
import { env } from "~/server/env.server";
import { listOutbox } from "~/server/outbox.server";

export const meta: Route.MetaFunction = () => [{ title: "Outbox (local fake) · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  if (!env.ENABLE_DEV_OUTBOX) throw new Response("Not found", { status: 404 });
  const to = new URL(request.url).searchParams.get("to")?.trim() || undefined;
  try {
    return { messages: await listOutbox(to), to: to ?? "", unreachable: false };
  } catch {
    return { messages: [], to: to ?? "", unreachable: true };
  }
}

function frameDoc(html: string) {
  // Links inside the message open in the main window, as they would from a mail program.
  return `<base target="_top"><style>body{margin:12px;font-family:sans-serif}</style>${html}`;
}

export default function DevOutbox({ loaderData }: Route.ComponentProps) {
  const { messages, to, unreachable } = loaderData;
  return (
    <>
      <PageHeader
        title="Outbox (local fake)"
        lead="Development only: the messages Kitwright sent through the local fake mail server. Nothing leaves this machine."
      />
      <Form method="get" className="mb-4 flex max-w-md gap-2">
        <input name="to" defaultValue={to} placeholder="Filter by recipient" aria-label="Filter by recipient" className={inputClass} />
        <button className="rounded-md border border-rule px-4">Filter</button>
      </Form>
      {unreachable ? <p className="text-fail">✕ The fake mail server is not answering (MAIL_FAKE_URL). Is it running?</p> : null}
      {!unreachable && messages.length === 0 ? <p className="text-ink-faint">No messages yet.</p> : null}
      <ol className="space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded-xl border border-rule bg-sheet p-4" data-testid="outbox-message">
            <dl className="figures grid grid-cols-[5rem_1fr] gap-x-3 gap-y-1 text-sm">
              <dt className="text-ink-faint">Subject</dt>
              <dd className="font-semibold">{m.subject}</dd>
              <dt className="text-ink-faint">From</dt>
              <dd>{m.from}</dd>
              <dt className="text-ink-faint">To</dt>
              <dd>{m.to.join(", ")}</dd>
              <dt className="text-ink-faint">Received</dt>
              <dd>{m.receivedAt.replace("T", " ").slice(0, 19)} UTC</dd>
            </dl>
            {m.html ? (
              <iframe
                title={`Message: ${m.subject}`}
                srcDoc={frameDoc(m.html)}
                sandbox="allow-top-navigation-by-user-activation allow-popups"
                className="mt-3 h-72 w-full rounded border border-rule bg-white"
              />
            ) : (
              <pre className="mt-3 whitespace-pre-wrap text-sm">{m.text}</pre>
            )}
          </li>
        ))}
      </ol>
    </>
  );
}
