/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // The test run builds into its own folder so it never fights a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // The card renderer, the database driver and the job queue stay server-side Node modules.
  serverExternalPackages: ["@react-pdf/renderer", "pg", "pg-boss"],
  // forbidden() answers a signed-in person with the wrong role with a real 403.
  experimental: { authInterrupts: true },
  // Next checks what the app imports; `npm run typecheck` covers the whole tree (CLI, benches, tests).
  // Each build folder has its own tsconfig so one build's generated types never go stale in the other's check.
  typescript: { tsconfigPath: process.env.NEXT_DIST_DIR === ".next-test" ? "tsconfig.e2e.json" : "tsconfig.app.json" },
};

export default nextConfig;
