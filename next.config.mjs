/** @type {import('next').NextConfig} */

/** The origin of an address from the environment, or nothing when it is unset or not a URL. */
function originOf(value) {
  if (!value) return null;
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}

/**
 * Where photos are served from and uploaded to. With the local upload service both are its own
 * address; with uploadthing itself files come from the app's ufs.sh host and uploads go to its
 * ingest hosts. Headers are fixed when the app is built, so the build sees the same environment
 * the server will run with.
 */
function uploadOrigins() {
  const files = originOf(process.env.UPLOADS_PUBLIC_URL) ?? 'https://*.ufs.sh';
  const ingest = originOf(process.env.UPLOADTHING_INGEST_URL) ?? 'https://*.ingest.uploadthing.com';
  return { files, ingest };
}

/** Stripe Checkout, or the local payments service (reached as 127.0.0.1, shown to browsers as localhost). */
function checkoutOrigins() {
  const api = originOf(process.env.STRIPE_API_URL);
  if (!api) return ['https://checkout.stripe.com'];
  return [...new Set([api, api.replace('//127.0.0.1', '//localhost')])];
}

export function contentSecurityPolicy({ dev = process.env.NODE_ENV === 'development' } = {}) {
  const { files, ingest } = uploadOrigins();
  const connect = [...new Set(["'self'", files, ingest])];
  return [
    "default-src 'self'",
    // The App Router streams its page data in small inline scripts without a nonce; every script
    // file still has to come from the app itself. The dev server also evaluates code for hot reload.
    `script-src 'self' 'unsafe-inline'${dev ? " 'unsafe-eval'" : ''}`,
    // React and the charts set style attributes; style sheets come only from the app.
    "style-src 'self' 'unsafe-inline'",
    "font-src 'self'",
    // Photo previews before upload are blob: addresses made in the page.
    `img-src 'self' data: blob: ${files}`,
    `connect-src ${connect.join(' ')}${dev ? ' ws:' : ''}`,
    "media-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    // Forms post to the app; buying a report ends in a redirect to the payment provider's checkout.
    `form-action ${["'self'", ...checkoutOrigins()].join(' ')}`,
    "frame-ancestors 'none'",
    "frame-src 'none'",
    "worker-src 'self' blob:",
    "manifest-src 'self'",
  ].join('; ');
}

const securityHeaders = [
  { key: 'Content-Security-Policy', value: contentSecurityPolicy() },
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Permissions-Policy', value: 'camera=(self), geolocation=(), microphone=()' },
  { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
];

const nextConfig = {
  reactStrictMode: true,
  // Separate build folders let several working copies of the stack run side by side (scripts/lib/stack.mjs).
  distDir: process.env.NEXT_DIST_DIR || '.next',
  poweredByHeader: false,
  // Types are checked once by `npm test` (tsc --noEmit over the whole project), not in every build.
  typescript: { ignoreBuildErrors: true },
  // sharp and the PDF renderer are native / heavy: load them from node_modules at run time.
  serverExternalPackages: ['sharp', '@react-pdf/renderer', 'mysql2'],
  async headers() {
    return [{ source: '/:path*', headers: securityHeaders }];
  },
};

export default nextConfig;
