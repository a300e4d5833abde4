/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // The test run builds into its own folder so it never fights a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // The card renderer and the database driver stay server-side Node modules.
  serverExternalPackages: ["@react-pdf/renderer", "pg"],
  // Next checks what the app imports; `npm run typecheck` covers the whole tree (CLI, benches, tests).
  typescript: { tsconfigPath: "tsconfig.app.json" },
};

export default nextConfig;
