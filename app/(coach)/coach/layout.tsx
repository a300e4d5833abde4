import type { ReactNode } from "react";
import { AppShell } from "@/components/AppShell";
import { pageViewer } from "@/server/guard";

export default async function CoachLayout({ children }: { children: ReactNode }) {
  const viewer = await pageViewer(["coach"], "/coach");
  return (
    <AppShell
      area="coach"
      viewerName={viewer.name}
      nav={[
        { href: "/coach", label: "Overview" },
        { href: "/coach/templates", label: "Templates" },
        { href: "/coach/athletes", label: "Athletes" },
      ]}
    >
      {children}
    </AppShell>
  );
}
