import { PageTitle } from "@/components/AppShell";
import { Caution } from "@/components/Caution";
import { EmptyState } from "@/components/EmptyState";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Today" };

export default async function AthleteToday() {
  const viewer = await pageViewer(["athlete"], "/athlete");
  const today = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "long", timeZone: "UTC" }).format(new Date());
  return (
    <>
      <PageTitle title="Today" lead={today} />
      <EmptyState title="Nothing planned for today">
        When your coach assigns you a programme, today&apos;s session shows here with your own loads and the plates for each side of the bar.
      </EmptyState>
      <Caution className="mt-6" />
    </>
  );
}
