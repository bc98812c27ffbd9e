/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Lets parallel work trees of one checkout build side by side (default .next).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  // argon2 ships a native binding: load it from node_modules at run time instead of bundling.
  serverExternalPackages: ["@node-rs/argon2"],
};

export default nextConfig;
