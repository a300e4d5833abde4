import type { ReactNode } from "react";
import { AppShell } from "@/components/AppShell";
import { pageViewer } from "@/server/guard";

export default async function AdminLayout({ children }: { children: ReactNode }) {
  const viewer = await pageViewer(["admin"], "/admin");
  return (
    <AppShell area="admin" viewerName={viewer.name} nav={[
        { href: "/admin", label: "Accounts" },
        { href: "/admin/mailbox", label: "Mailbox" },
        { href: "/admin/listings", label: "Store listings" },
      ]}>
      {children}
    </AppShell>
  );
}
