/** @type {import('next').NextConfig} */
const nextConfig = {
  // knex's optional drivers (pg, mysql, oracledb…) break bundling; load it from node_modules.
  // piscina starts its workers from its own files in node_modules (the PDF pool, app/lib/pdf-pool.ts).
  serverExternalPackages: ['knex', 'better-sqlite3', 'pg', 'sharp', 'piscina'],
  // Tests and parallel builds can use their own output folder.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  poweredByHeader: false,
  // Every response, files and API included (the same list as SECURITY_HEADERS in lib/content-security-policy.ts;
  // the proxy adds the nonce-based Content-Security-Policy to pages).
  async headers() {
    return [
      {
        source: '/:path*',
        headers: [
          { key: 'X-Frame-Options', value: 'DENY' },
          { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
          { key: 'X-Content-Type-Options', value: 'nosniff' },
        ],
      },
      // JSON and files are never documents to run or frame.
      { source: '/api/:path*', headers: [{ key: 'Content-Security-Policy', value: "default-src 'none'; frame-ancestors 'none'" }] },
    ];
  },
  experimental: {
    serverActions: { bodySizeLimit: '1mb' },
    // forbidden() in pages answers 403 with app/forbidden.tsx (app/lib/page-access.ts).
    authInterrupts: true,
  },
};

export default nextConfig;
