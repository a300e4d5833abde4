import { getToken } from "next-auth/jwt";
import { type NextRequest, NextResponse } from "next/server";

// First line of defence only: each layout, page, handler and action checks the
// session and role again itself.
const AREAS: { prefix: string; role: "admin" | "coach" | "athlete" }[] = [
  { prefix: "/admin", role: "admin" },
  { prefix: "/coach", role: "coach" },
  { prefix: "/athlete", role: "athlete" },
];

export async function proxy(req: NextRequest) {
  const { pathname, search } = req.nextUrl;
  const area = AREAS.find((a) => pathname === a.prefix || pathname.startsWith(`${a.prefix}/`));
  if (!area) return NextResponse.next();
  const token = await getToken({ req, secret: process.env.NEXTAUTH_SECRET });
  if (!token) {
    const url = new URL("/signin", req.url);
    url.searchParams.set("callbackUrl", pathname + search);
    return NextResponse.redirect(url);
  }
  if (token.role !== area.role) {
    return NextResponse.rewrite(new URL("/forbidden", req.url), { status: 403 });
  }
  return NextResponse.next();
}

export const config = {
  matcher: ["/admin/:path*", "/coach/:path*", "/athlete/:path*"],
};
