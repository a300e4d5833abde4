import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";

export const metadata = { title: "Templates" };

export default function TemplatesPage() {
  return (
    <>
      <PageTitle title="Templates" lead="Programmes you write once and hand to many athletes, each version kept." />
      <EmptyState title="Your template shelf is empty">
        Templates you write, fork or buy will be listed here with their versions, tags and who they are assigned to.
      </EmptyState>
    </>
  );
}
