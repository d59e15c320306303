import { SavedAssessmentView } from "@/components/projects/saved-assessment-view";

export const metadata = { title: "Saved assessment — Hydrastate" };

export default async function SavedAssessmentPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  return <SavedAssessmentView id={id} />;
}
