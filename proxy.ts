import { NextResponse, type NextRequest } from 'next/server';

// The proxy only sends signed-out visitors to the sign-in page; every page, action and route
// handler checks the session and the role again on the server.
const SESSION_COOKIES = ['authjs.session-token', '__Secure-authjs.session-token'];

export function proxy(request: NextRequest) {
  const signedIn = SESSION_COOKIES.some((name) => request.cookies.has(name));
  if (signedIn) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = '/sign-in';
  url.search = `?callbackUrl=${encodeURIComponent(request.nextUrl.pathname + request.nextUrl.search)}`;
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ['/dashboard/:path*', '/machines/:path*', '/inspections/:path*', '/jobs/:path*', '/reports/:path*', '/compare/:path*', '/purchases/:path*', '/admin/:path*', '/account/:path*'],
};
