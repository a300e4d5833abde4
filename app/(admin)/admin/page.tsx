import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { getDb } from "@/db/client";
import { listUsers } from "@/db/users";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Accounts" };

const fmt = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

export default async function AdminHome() {
  const viewer = await pageViewer(["admin"], "/admin");
  const users = await listUsers(getDb(), viewer);
  return (
    <>
      <PageTitle title="Accounts" lead="Everyone with an Ironquill account and the role they hold." />
      {users.length === 0 ? (
        <EmptyState title="No accounts">Accounts appear here as coaches sign up and athletes accept invitations.</EmptyState>
      ) : (
        <div className="panel overflow-x-auto">
          <table className="w-full min-w-[32rem] text-left text-sm">
            <thead className="border-b border-chalk-200 text-xs uppercase tracking-wider text-iron-400">
              <tr>
                <th className="px-4 py-3 font-semibold">Name</th>
                <th className="px-4 py-3 font-semibold">E-mail</th>
                <th className="px-4 py-3 font-semibold">Role</th>
                <th className="px-4 py-3 font-semibold">Joined</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-chalk-200">
              {users.map((u) => (
                <tr key={u.id}>
                  <td className="px-4 py-3 font-medium">{u.name}</td>
                  <td className="px-4 py-3 text-iron-500">{u.email}</td>
                  <td className="px-4 py-3">
                    <span className="rounded bg-chalk-200 px-2 py-0.5 text-xs font-semibold capitalize text-iron-700">{u.role}</span>
                  </td>
                  <td className="px-4 py-3 text-iron-500">{fmt.format(u.createdAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}
