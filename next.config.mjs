/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that the bundler cannot follow.
  serverExternalPackages: ['sequelize', 'pg', 'pg-hstore'],
  poweredByHeader: false,
};

export default nextConfig;
