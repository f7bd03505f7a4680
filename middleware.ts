import { NextResponse, type NextRequest } from "next/server";

// Cheap redirect only: no session cookie → sign-in page. Every page, handler and action checks
// the session, club and ability again on the server; this is never the guard.
const SESSION_COOKIES = ["authjs.session-token", "__Secure-authjs.session-token"];

export function middleware(request: NextRequest) {
  const hasSession = SESSION_COOKIES.some((name) => request.cookies.has(name));
  if (hasSession) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?callbackUrl=${encodeURIComponent(request.nextUrl.pathname + request.nextUrl.search)}`;
  return NextResponse.redirect(url);
}

export const config = { matcher: ["/clubs/:path*", "/operator/:path*"] };
