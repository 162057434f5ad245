import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, useNavigation } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/admin-users";
import { inputClass } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { ROLE_LIST } from "~/lib/roles";
import { redirectWithFlash } from "~/server/flash.server";
import { requireRole } from "~/server/guards.server";
import { listUsers, setUserRole, USERS_PAGE_SIZE } from "~/server/users.server";

export const meta: Route.MetaFunction = () => [{ title: "Users · Kitwright" }];

const roleSchema = z.object({ userId: z.string().min(1).max(100), role: z.enum(ROLE_LIST, "Pick one of the four roles.") });

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, "admin");
  const url = new URL(request.url);
  const search = (url.searchParams.get("q") ?? "").trim().slice(0, 100);
  const page = Math.max(1, Math.min(10000, Number.parseInt(url.searchParams.get("page") ?? "1", 10) || 1));
  return { ...(await listUsers({ search, page })), search, page, pageSize: USERS_PAGE_SIZE };
}

export async function action({ request }: Route.ActionArgs) {
  const admin = await requireRole(request, "admin");
  const submission = parseWithZod(await request.formData(), { schema: roleSchema });
  if (submission.status !== "success") return data({ error: "Pick one of the four roles." }, { status: 400 });
  const { userId, role } = submission.value;
  if (userId === admin.id && role !== "admin") return data({ error: "You cannot remove your own admin role; ask another admin." }, { status: 400 });
  if (!(await setUserRole(userId, role))) throw new Response("No such user.", { status: 404 });
  return redirectWithFlash(new URL(request.url).pathname + new URL(request.url).search, { kind: "success", message: `Role changed to ${role}.` });
}

export default function AdminUsers({ loaderData, actionData }: Route.ComponentProps) {
  const { rows, total, search, page, pageSize } = loaderData;
  const navigation = useNavigation();
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <>
      <PageHeader title="Users" lead="Every account on the service, and its role. Installers belong to a team; curators steward the shared catalogue." />
      {actionData?.error ? <p className="mb-4 text-sm text-fail">✕ {actionData.error}</p> : null}
      <Panel>
        <Form method="get" className="mb-4 flex gap-2">
          <input name="q" defaultValue={search} placeholder="Search name or e-mail" aria-label="Search name or e-mail" className={inputClass} />
          <button className="rounded-md border border-rule px-4">Search</button>
        </Form>
        <div className="overflow-x-auto">
          <table className="figures w-full text-left text-sm">
            <thead className="border-b border-rule text-ink-faint">
              <tr>
                <th className="py-2 pr-3 font-medium">Name</th>
                <th className="py-2 pr-3 font-medium">E-mail</th>
                <th className="py-2 pr-3 font-medium">Team</th>
                <th className="py-2 pr-3 font-medium">Joined</th>
                <th className="py-2 font-medium">Role</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {rows.map((u) => (
                <tr key={u.id}>
                  <td className="py-2 pr-3 font-medium">{u.name}</td>
                  <td className="py-2 pr-3">{u.email}</td>
                  <td className="py-2 pr-3">{u.teamName ? `${u.teamName}${u.membershipRole === "owner" ? " (owner)" : ""}` : "—"}</td>
                  <td className="py-2 pr-3">{new Date(u.createdAt).toISOString().slice(0, 10)}</td>
                  <td className="py-2">
                    <Form method="post" className="flex gap-2">
                      <input type="hidden" name="userId" value={u.id} />
                      <select
                        name="role"
                        defaultValue={u.role ?? "installer"}
                        aria-label={`Role of ${u.name}`}
                        className="rounded border border-rule bg-sheet px-2 py-1"
                      >
                        {ROLE_LIST.map((r) => (
                          <option key={r} value={r}>
                            {r}
                          </option>
                        ))}
                      </select>
                      <button type="submit" disabled={navigation.state !== "idle"} className="rounded border border-rule px-2 py-1 hover:bg-paper-deep">
                        Save
                      </button>
                    </Form>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p className="mt-4 flex items-center gap-3 text-sm text-ink-soft">
          {total} account{total === 1 ? "" : "s"} · page {page} of {pages}
          {page > 1 ? (
            <Link to={`?q=${encodeURIComponent(search)}&page=${page - 1}`} className="underline">
              ← previous
            </Link>
          ) : null}
          {page < pages ? (
            <Link to={`?q=${encodeURIComponent(search)}&page=${page + 1}`} className="underline">
              next →
            </Link>
          ) : null}
        </p>
      </Panel>
    </>
  );
}
