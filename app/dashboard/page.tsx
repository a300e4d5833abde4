import { redirect } from "next/navigation";
import { getViewer, homeFor } from "@/server/auth";

// After sign-in everyone lands here and is sent to the area their role opens.
export default async function Dashboard() {
  const viewer = await getViewer();
  redirect(viewer ? homeFor(viewer.role) : "/signin");
}
