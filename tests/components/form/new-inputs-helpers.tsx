import { expect } from "vitest";
import { fireEvent, screen, waitFor } from "@testing-library/react";

/** Loads the demo scenario (a valid input) so that a test changes only the part it checks. */
export async function loadDemo() {
  fireEvent.click(screen.getByRole("button", { name: /load the demo scenario/i }));
  await screen.findByText(/Demo scenario \(invented numbers\)/);
  await waitFor(() => expect((screen.getByLabelText(/Project name/) as HTMLInputElement).value).not.toBe(""));
}

export function type(label: RegExp | string, value: string) {
  const input = screen.getByLabelText(label) as HTMLInputElement;
  fireEvent.input(input, { target: { value } });
  return input;
}

export function submit() {
  fireEvent.click(screen.getByRole("button", { name: /run the assessment/i }));
}

/** The texts an input points to with aria-describedby (hint and error). */
export function describedText(element: Element): string {
  return (element.getAttribute("aria-describedby") ?? "")
    .split(" ")
    .filter(Boolean)
    .map((id) => document.getElementById(id)?.textContent ?? "")
    .join(" ");
}
