export default function HomePage() {
  return (
    <main>
      <h1>Hydrastate</h1>
      <p>
        Concrete durability and curing advisory: the thermodynamic equilibrium hydrate assemblage of a binder, its
        durability scenarios and the curing temperature of the element.
      </p>
      <p role="note">
        Hydrastate is a guide. Equilibrium is not kinetics, the thermodynamic data carry uncertainty, and design
        decisions rest with the governing codes and standards, licensed testing and a responsible engineer.
      </p>
    </main>
  );
}
