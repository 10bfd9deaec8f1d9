import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useForm, type Resolver } from "react-hook-form";
import { afterEach, describe, expect, it } from "vitest";
import { zodResolver } from "@hookform/resolvers/zod";
import type { LengthUnit } from "@/engine/units";
import { buildFormSchema } from "../model/form-schema";
import { formStateFromTemplateValues, type FormValues } from "../model/form-values";
import { fixtureTemplate } from "../test/fixture-template";
import { ParameterForm } from "./parameter-form";

afterEach(() => cleanup());

const specs = fixtureTemplate.parameters;

function Harness({ units }: { units: LengthUnit }) {
  const state = formStateFromTemplateValues(specs, {}, "mm", units);
  const form = useForm<FormValues>({
    defaultValues: state.values,
    mode: "onChange",
    resolver: zodResolver(
      buildFormSchema(specs, "mm", units, () => state.exact),
    ) as unknown as Resolver<FormValues>,
  });
  return (
    <ParameterForm
      specs={specs}
      form={form}
      templateUnits="mm"
      units={units}
      materialNames={fixtureTemplate.materialNames!}
    />
  );
}

describe("form generated from a parameter list", () => {
  it("makes one fieldset per group, in the template's order, each parameter in its group", () => {
    render(<Harness units="mm" />);
    const groups = screen.getAllByRole("group");
    expect(groups.map((g) => g.querySelector("legend")?.textContent)).toEqual([
      "Your vise",
      "Cam",
      "Materials",
    ]);
    const vise = within(screen.getByRole("group", { name: "Your vise" }));
    expect(vise.getByLabelText(/Jaw width/)).toBeTruthy();
    expect(vise.getByLabelText(/Jaw thickness/)).toBeTruthy();
    expect(vise.queryByLabelText(/Hand force/)).toBeNull();
  });

  it("chooses the input by kind: numbers as text boxes, materials and choices as lists, yes/no as a tick box", () => {
    render(<Harness units="mm" />);
    expect((screen.getByLabelText(/Jaw width/) as HTMLInputElement).value).toBe("100");
    expect(screen.getByLabelText(/Jaw width/).getAttribute("inputmode")).toBe("decimal");
    expect(screen.getByLabelText(/Cross holes/).getAttribute("inputmode")).toBe("numeric");
    const material = screen.getByLabelText("Body material") as HTMLSelectElement;
    expect(material.tagName).toBe("SELECT");
    expect([...material.options].map((o) => o.textContent)).toEqual(["Mild steel", "Brass"]);
    const finish = screen.getByLabelText("Finish") as HTMLSelectElement;
    expect([...finish.options].map((o) => [o.value, o.textContent])).toEqual([
      ["plain", "plain"],
      ["blued", "Cold blued"],
    ]);
    const chamfer = screen.getByLabelText("Chamfer the edges") as HTMLInputElement;
    expect(chamfer.type).toBe("checkbox");
    expect(chamfer.checked).toBe(true);
  });

  it("shows the unit on every numeric field, the allowed range and the help text", () => {
    render(<Harness units="mm" />);
    const unitOf = (label: RegExp) => screen.getByLabelText(label).parentElement!.textContent;
    expect(unitOf(/Jaw width/)).toBe("mm");
    expect(unitOf(/Hand force/)).toBe("N");
    expect(unitOf(/Lever angle/)).toBe("°");
    expect(unitOf(/Friction coefficient/)).toBe("ratio");
    expect(unitOf(/Cross holes/)).toBe("count");
    // The spoken unit is part of the label, the range and help are tied to the input.
    expect(screen.getByLabelText("Jaw width (millimetres)")).toBeTruthy();
    const described = screen
      .getByLabelText(/Jaw width/)
      .getAttribute("aria-describedby")!
      .split(" ");
    const texts = described.map((id) => document.getElementById(id)?.textContent);
    expect(texts).toEqual(["20–250 mm", "Across the jaw face."]);
  });

  it("shows lengths and their limits in inches when the user works in inches", () => {
    render(<Harness units="in" />);
    expect((screen.getByLabelText(/Jaw width/) as HTMLInputElement).value).toBe("3.93701");
    expect(screen.getByLabelText(/Jaw width/).parentElement!.textContent).toBe("in");
    expect(screen.getByText("0.7874–9.8425 in")).toBeTruthy();
    expect(screen.getByLabelText("Jaw width (inches)")).toBeTruthy();
    // A force stays in newtons, with pounds-force beside it for inch users.
    expect(screen.getByText(/≈ 22.5 lbf/)).toBeTruthy();
  });

  it("puts a limit message in the field, in the user's units, and marks it invalid", async () => {
    render(<Harness units="mm" />);
    const width = screen.getByLabelText(/Jaw width/);
    await userEvent.clear(width);
    await userEvent.type(width, "300");
    expect(await screen.findByText("Jaw width must be at most 250 mm (allowed 20–250 mm).")).toBeTruthy();
    expect(width.getAttribute("aria-invalid")).toBe("true");
    const holes = screen.getByLabelText(/Cross holes/);
    await userEvent.clear(holes);
    await userEvent.type(holes, "2.5");
    expect(await screen.findByText("Cross holes must be a whole number from 1–6.")).toBeTruthy();
  });

  it("steps a number with the arrow keys by the parameter's step", async () => {
    render(<Harness units="mm" />);
    const width = screen.getByLabelText(/Jaw width/) as HTMLInputElement;
    width.focus();
    await userEvent.keyboard("{ArrowUp}{ArrowUp}");
    expect(width.value).toBe("102");
  });
});
