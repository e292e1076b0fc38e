/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its driver dynamically; bundling it breaks database routes at run time.
  serverExternalPackages: ['sequelize', 'pg', 'pg-hstore', 'pg-boss', 'nodemailer', 'bcryptjs', 'rate-limiter-flexible'],
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
