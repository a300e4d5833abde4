import type { ReactNode } from "react";
import { StoreFrame } from "@/components/store/StoreFrame";
import { getViewer } from "@/server/auth";

/** The store is public: pages ask for the viewer themselves and only some need one. */
export default async function StoreLayout({ children }: { children: ReactNode }) {
  const viewer = await getViewer();
  return <StoreFrame viewer={viewer}>{children}</StoreFrame>;
}
