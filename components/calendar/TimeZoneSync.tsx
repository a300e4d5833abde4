"use client";
import { useRouter } from "next/navigation";
import { useEffect } from "react";
import { TZ_COOKIE } from "./tzCookie";

/**
 * Tells the server the browser's time zone (a cookie), and re-renders the page
 * once when it was missing or changed, so "today" is the person's own day.
 */
export function TimeZoneSync() {
  const router = useRouter();
  useEffect(() => {
    const tz = Intl.DateTimeFormat().resolvedOptions().timeZone;
    if (!tz) return;
    const current = document.cookie.split("; ").find((c) => c.startsWith(`${TZ_COOKIE}=`))?.slice(TZ_COOKIE.length + 1);
    if (current && decodeURIComponent(current) === tz) return;
    document.cookie = `${TZ_COOKIE}=${encodeURIComponent(tz)}; path=/; max-age=31536000; samesite=lax`;
    router.refresh();
  }, [router]);
  return null;
}
