/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Sequelize loads its dialect at run time; keep it and the driver out of the bundle.
  serverExternalPackages: ['sequelize', 'mariadb'],
  typedRoutes: false,
};

export default nextConfig;
