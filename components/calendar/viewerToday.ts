import "server-only";
import { cookies } from "next/headers";
import { todayFor } from "@/lib/calendar";
import { TZ_COOKIE } from "./tzCookie";

/** Today for the person asking, in the time zone their browser reported (TimeZoneSync); the UTC day until it has. */
export async function viewerToday(): Promise<string> {
  return todayFor((await cookies()).get(TZ_COOKIE)?.value);
}
