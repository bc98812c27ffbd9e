/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // argon2 ships a native binding: load it from node_modules at run time instead of bundling.
  serverExternalPackages: ["@node-rs/argon2"],
};

export default nextConfig;
