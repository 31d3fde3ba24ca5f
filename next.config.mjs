/** @type {import('next').NextConfig} */
const securityHeaders = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Permissions-Policy', value: 'camera=(self), geolocation=(), microphone=()' },
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
