/** @type {import('next').NextConfig} */
const nextConfig = {
  // Native modules stay outside the server bundle and load from node_modules.
  serverExternalPackages: ['better-sqlite3', 'sharp', '@node-rs/argon2', 'piscina'],
  distDir: process.env.NEXT_DIST_DIR || '.next',
  poweredByHeader: false,
  // Types are checked once by `tsc --noEmit` in the test command (scripts/test.ts),
  // over the whole tree, instead of a second time inside every build.
  typescript: { ignoreBuildErrors: true },
};

export default nextConfig;
