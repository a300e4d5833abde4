import { PageTitle } from "@/components/AppShell";
import { AccountsTable } from "@/components/admin/AccountsTable";
import { EmptyState } from "@/components/EmptyState";
import { getDb } from "@/db/client";
import { listUsers } from "@/db/users";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Accounts" };

export default async function AdminHome() {
  const viewer = await pageViewer(["admin"], "/admin");
  const users = await listUsers(getDb(), viewer);
  return (
    <>
      <PageTitle title="Accounts" lead="Everyone with an Ironquill account and the role they hold. Disabling an account signs the person out at once and keeps everything of theirs; a role changes once nothing of the old role is left." />
      {users.length === 0 ? (
        <EmptyState title="No accounts">Accounts appear here as coaches sign up and athletes accept invitations.</EmptyState>
      ) : (
        <AccountsTable initial={users.map((u) => ({ ...u, createdAt: u.createdAt.toISOString() }))} selfId={viewer.id} />
      )}
    </>
  );
}
