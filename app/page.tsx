import { Workbench } from "@/components/workbench";
import { loadSavedInputs } from "@/components/load-saved-inputs";

export const dynamic = "force-dynamic";

export default async function HomePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const from = typeof params.from === "string" ? params.from : undefined;
  const saved = from ? await loadSavedInputs(from) : null;
  return (
    <>
      <h1>Concrete durability and curing assessment</h1>
      <p className="lead">
        The equilibrium hydrate assemblage of a binder at its age, its durability scenarios in the exposure, and the curing temperature of the
        element, with risk flags and the standards they rest on. Fill the sections in order, or load the demo scenario.
      </p>
      <Workbench initialValues={saved?.inputs} fromName={saved?.name} />
    </>
  );
}
