import type { ReactNode } from "react";
import { AppShell } from "@/components/AppShell";
import { QueryProvider } from "@/components/QueryProvider";
import { pageViewer } from "@/server/guard";

export default async function CoachLayout({ children }: { children: ReactNode }) {
  const viewer = await pageViewer(["coach"], "/coach");
  return (
    <AppShell
      area="coach"
      viewerName={viewer.name}
      nav={[
        { href: "/coach", label: "Overview" },
        { href: "/coach/dashboard", label: "Who trained" },
        { href: "/coach/athletes", label: "Athletes" },
        { href: "/coach/templates", label: "Templates" },
        { href: "/coach/library", label: "Exercise library" },
        { href: "/coach/recipes", label: "Recipes" },
        { href: "/coach/sales", label: "Sales" },
        { href: "/docs/notation", label: "Notation guide" },
      ]}
    >
      <QueryProvider>{children}</QueryProvider>
    </AppShell>
  );
}
