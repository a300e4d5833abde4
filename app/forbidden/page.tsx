import { Forbidden } from "@/components/AppShell";

export const metadata = { title: "Not allowed" };

export default function ForbiddenPage() {
  return <Forbidden area="page you asked for" />;
}
