import type { ReactNode } from "react";
import "./globals.css";

export const metadata = {
  title: "Hydrastate — concrete durability and curing advisory",
  description:
    "Thermodynamic equilibrium of hydrated binders, durability scenarios and curing models. A guide that defers to codes, standards and licensed testing.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body>
        <a className="skip-link" href="#main">
          Skip to the content
        </a>
        <header className="site-header">
          <a className="brand" href="/">
            Hydrastate
          </a>
          <nav aria-label="Main">
            <ul>
              <li>
                <a href="/">New assessment</a>
              </li>
              <li>
                <a href="/projects">Project files</a>
              </li>
              <li>
                <a href="/validation">Validation dossier</a>
              </li>
            </ul>
          </nav>
        </header>
        <main id="main" tabIndex={-1}>
          {children}
        </main>
        <footer className="site-footer">
          <p>
            Hydrastate is a guide. Equilibrium is not kinetics, the thermodynamic data carry uncertainty, and design decisions rest with the
            governing codes and standards, licensed testing and a responsible engineer.
          </p>
        </footer>
      </body>
    </html>
  );
}
