/** @type {import('next').NextConfig} */
const nextConfig = {
  // Native module and PDF fonts are loaded at run time on the server, not bundled.
  serverExternalPackages: ["better-sqlite3", "pdfkit"],
  poweredByHeader: false,
};
export default nextConfig;
