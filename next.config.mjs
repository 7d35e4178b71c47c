/** @type {import('next').NextConfig} */
const securityHeaders = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Referrer-Policy', value: 'same-origin' },
  // Serial is allowed for this origin only: the bench reads scales through Web Serial.
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), serial=(self)' },
];

const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // forbidden(): a page a role may not see answers 403 with its explanation, not a redirect.
  experimental: { authInterrupts: true },
  serverExternalPackages: ['sequelize', 'mariadb', 'pino', 'smtp-server', 'mailparser', 'bwip-js', 'pdf-lib', '@pdf-lib/fontkit', 'ipp', 'piscina'],
  async headers() {
    return [{ source: '/:path*', headers: securityHeaders }];
  },
};

export default nextConfig;
