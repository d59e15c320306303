import { ProjectList } from "@/components/projects/project-list";

export const metadata = { title: "Project files — Hydrastate" };

export default function ProjectsPage() {
  return (
    <>
      <h1>Project files</h1>
      <p className="lead">Saved assessments with their inputs, results and the data-set and engine versions they were computed with.</p>
      <ProjectList />
    </>
  );
}
