import { NextResponse, type NextRequest } from 'next/server';

// Hands the requested path to server layouts, so a sign-in redirect can return the user there.
export function proxy(req: NextRequest) {
  const headers = new Headers(req.headers);
  headers.set('x-rungbook-path', req.nextUrl.pathname + req.nextUrl.search);
  return NextResponse.next({ request: { headers } });
}

export const config = { matcher: ['/((?!api|_next/static|_next/image|sw.js|icons|manifest.webmanifest).*)'] };
