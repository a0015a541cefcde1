/** @type {import('next').NextConfig} */
const nextConfig = {
  // The test run builds into its own folder so it can run beside `npm start`.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  reactStrictMode: true,
  poweredByHeader: false,
  // Native or Node-only packages stay outside the server bundle.
  serverExternalPackages: ["pg", "pg-boss", "nodemailer", "bcryptjs"],
  // `npm test` type-checks the whole project as its own stage; the build need not do it twice.
  typescript: { ignoreBuildErrors: true },
  // A git worktree whose node_modules links to another checkout needs a wider Turbopack root.
  ...(process.env.NEXT_TURBOPACK_ROOT ? { turbopack: { root: process.env.NEXT_TURBOPACK_ROOT } } : {}),
};

export default nextConfig;
