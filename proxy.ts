import { getToken } from "next-auth/jwt";
import { type NextRequest, NextResponse } from "next/server";

// First line of defence only: anonymous visitors are sent to sign in. Each
// layout, page, handler and action checks the session and role itself (and
// answers a wrong role with 403).
const AREAS = ["/admin", "/coach", "/athlete"];

export async function proxy(req: NextRequest) {
  const { pathname, search } = req.nextUrl;
  const inArea = AREAS.some((prefix) => pathname === prefix || pathname.startsWith(`${prefix}/`));
  if (!inArea) return NextResponse.next();
  const token = await getToken({ req, secret: process.env.NEXTAUTH_SECRET });
  if (!token) {
    const url = new URL("/signin", req.url);
    url.searchParams.set("callbackUrl", pathname + search);
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = {
  matcher: ["/admin/:path*", "/coach/:path*", "/athlete/:path*"],
};
