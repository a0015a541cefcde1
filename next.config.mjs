/** @type {import('next').NextConfig} */
const nextConfig = {
  // The test run builds into its own folder so it can run beside `npm start`.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  reactStrictMode: true,
  poweredByHeader: false,
  // Native or Node-only packages stay outside the server bundle.
  serverExternalPackages: ["pg", "pg-boss", "nodemailer", "bcryptjs"],
  typedRoutes: false,
};

export default nextConfig;
