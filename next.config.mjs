/** @type {import('next').NextConfig} */
const nextConfig = {
  // Knex and pg load drivers dynamically; bundling them breaks that. The local stand-ins and
  // PDF/argon2 packages are Node-only as well.
  serverExternalPackages: ["knex", "pg", "@node-rs/argon2", "pdfkit", "maildev", "s3rver"],
  poweredByHeader: false,
  // The test command runs `tsc --noEmit` over the whole tree (app, engine, db, tests) as its own
  // step; the build need not repeat it.
  typescript: { ignoreBuildErrors: true },
  typedRoutes: false,
  // forbidden() renders app/forbidden.tsx with a 403 for members who lack a role.
  experimental: { authInterrupts: true },
  // Tests build once into the same folder; the start script reuses a build that is newer than the sources.
  distDir: process.env.PIERWISE_DIST_DIR ?? ".next",
  // `npm run bench:web` builds with PIERWISE_BENCH_BUILD=1: only then do `*.bench.ts` files (the
  // empty route handler it measures against) become routes.
  pageExtensions: ["tsx", "ts", "jsx", "js", ...(process.env.PIERWISE_BENCH_BUILD === "1" ? ["bench.ts"] : [])],
};

export default nextConfig;
