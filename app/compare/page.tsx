import { CompareView } from "@/components/projects/compare-view";

export const metadata = { title: "Compare assessments — Hydrastate" };

export default async function ComparePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const raw = typeof params.ids === "string" ? params.ids : "";
  const ids = raw.split(",").map((id) => id.trim()).filter(Boolean);
  return (
    <>
      <h1>Compare saved assessments</h1>
      {ids.length < 2 || ids.length > 4 ? (
        <p role="alert">
          Choose two to four assessments on the <a href="/projects">project files</a> page (got {ids.length}).
        </p>
      ) : (
        <CompareView ids={ids} />
      )}
    </>
  );
}
