/** @type {import('next').NextConfig} */
const nextConfig = {
  // knex's optional drivers (pg, mysql, oracledb…) break bundling; load it from node_modules.
  serverExternalPackages: ['knex', 'better-sqlite3', 'pg', 'sharp'],
  // Tests and parallel builds can use their own output folder.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  poweredByHeader: false,
  experimental: {
    serverActions: { bodySizeLimit: '1mb' },
  },
};

export default nextConfig;
