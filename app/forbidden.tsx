import { Forbidden } from "@/components/AppShell";

export default function ForbiddenPage() {
  return <Forbidden area="page you asked for" />;
}
