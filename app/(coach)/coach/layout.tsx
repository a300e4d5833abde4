import type { ReactNode } from "react";
import { AppShell, Forbidden } from "@/components/AppShell";
import { pageViewer } from "@/server/guard";

export default async function CoachLayout({ children }: { children: ReactNode }) {
  const viewer = await pageViewer(["coach"], "/coach");
  if ("forbidden" in viewer) return <Forbidden area="coach desk" />;
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
