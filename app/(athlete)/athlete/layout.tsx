import type { ReactNode } from "react";
import { AppShell } from "@/components/AppShell";
import { QueryProvider } from "@/components/QueryProvider";
import { pageViewer } from "@/server/guard";

export default async function AthleteLayout({ children }: { children: ReactNode }) {
  const viewer = await pageViewer(["athlete"], "/athlete");
  return (
    <AppShell area="athlete" viewerName={viewer.name} nav={[
        { href: "/athlete", label: "Today" },
        { href: "/athlete/calendar", label: "Calendar" },
        { href: "/athlete/history", label: "Progress" },
        { href: "/athlete/profile", label: "Gym and maxes" },
        { href: "/athlete/recipes", label: "Recipes" },
        { href: "/store/purchases", label: "Purchases" },
      ]}>
      <QueryProvider>{children}</QueryProvider>
    </AppShell>
  );
}
