// @vitest-environment jsdom
import { describe, it, expect, afterEach } from "vitest";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { FormProvider, useForm } from "react-hook-form";
import { OxideFields } from "../../../components/form/oxide-fields";

afterEach(cleanup);

function Harness() {
  const methods = useForm({ defaultValues: {} });
  return (
    <FormProvider {...methods}>
      <OxideFields prefix="cement.oxides" />
    </FormProvider>
  );
}

describe("oxide fields", () => {
  it("sums the analysis live as the engineer types and warns while the total is outside 97–101 %", async () => {
    render(<Harness />);
    fireEvent.input(screen.getByLabelText(/^CaO/), { target: { value: "63.5" } });
    expect((await screen.findByTestId("oxide-total")).textContent).toBe("63.50 mass %");
    expect(screen.getByRole("status").textContent).toMatch(/warning: outside 97–101 %/);
    fireEvent.input(screen.getByLabelText(/^SiO₂/), { target: { value: "20.3" } });
    fireEvent.input(screen.getByLabelText(/^Al₂O₃/), { target: { value: "4.8" } });
    fireEvent.input(screen.getByLabelText(/^Fe₂O₃/), { target: { value: "3.0" } });
    fireEvent.input(screen.getByLabelText(/^MgO/), { target: { value: "1.8" } });
    fireEvent.input(screen.getByLabelText(/^SO₃/), { target: { value: "3.1" } });
    fireEvent.input(screen.getByLabelText(/^Loss on ignition/), { target: { value: "2.5" } });
    expect((await screen.findByTestId("oxide-total")).textContent).toBe("99.00 mass %");
    expect(screen.getByRole("status").textContent).toMatch(/within 97–101 %/);
  });

  it("fills the fields from a pasted spreadsheet row", async () => {
    render(<Harness />);
    fireEvent.click(screen.getByText("Paste a spreadsheet row"));
    fireEvent.change(screen.getByLabelText(/Row of values in the order/), { target: { value: "64\t21\t5\t3\t2\t3\t\t\t\t\t\t\t2" } });
    fireEvent.click(screen.getByRole("button", { name: "Fill the analysis" }));
    expect((screen.getByLabelText(/^CaO/) as HTMLInputElement).value).toBe("64");
    expect((screen.getByLabelText(/^Loss on ignition/) as HTMLInputElement).value).toBe("2");
    expect((await screen.findByTestId("oxide-total")).textContent).toBe("100.00 mass %");
  });
});
