import type { ReactNode } from "react";

export const metadata = {
  title: "Hydrastate — concrete durability and curing advisory",
  description:
    "Thermodynamic equilibrium of hydrated binders, durability scenarios and curing models. A guide that defers to codes, standards and licensed testing.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body>{children}</body>
    </html>
  );
}
