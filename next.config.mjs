/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // scripts/serve.ts compresses every response itself, at a cheaper level.
  compress: false,
  // The server binds loopback by default; the app is served under one origin.
  serverExternalPackages: ['pg', 'pg-boss', 'nodemailer'],
  // Pages and API answers get their security headers in proxy.ts; the build's static files, which
  // the proxy skips, get the one that matters for scripts and styles.
  async headers() {
    return [{ source: '/_next/static/:path*', headers: [{ key: 'X-Content-Type-Options', value: 'nosniff' }] }];
  },
};

export default nextConfig;
