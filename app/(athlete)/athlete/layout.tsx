import type { ReactNode } from "react";
import { AppShell } from "@/components/AppShell";
import { QueryProvider } from "@/components/QueryProvider";
import { pageViewer } from "@/server/guard";

export default async function AthleteLayout({ children }: { children: ReactNode }) {
  const viewer = await pageViewer(["athlete"], "/athlete");
  return (
    <AppShell area="athlete" viewerName={viewer.name} nav={[{ href: "/athlete", label: "Today" }]}>
      <QueryProvider>{children}</QueryProvider>
    </AppShell>
  );
}
