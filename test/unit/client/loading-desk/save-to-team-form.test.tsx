import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SaveToTeamForm } from "@/components/loading-desk/save-to-team-form";
import { ApiError } from "@/lib/client/data/api-fetch";
import type { CreateScenarioResponse } from "@/lib/client/data/types";
import type { CreateScenarioVars } from "@/lib/client/data/use-save-revision";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";

afterEach(cleanup);

const file = { ...defaultScenario(), name: "Crash rib, transverse" };
const teams = [
  { slug: "demo", name: "Demo composites lab" },
  { slug: "rig", name: "Rig team" },
];
const created = { scenario: { id: "sc-1" }, revision: { number: 1 } } as CreateScenarioResponse;

function renderForm(overrides: Partial<Parameters<typeof SaveToTeamForm>[0]> = {}) {
  const props = {
    teams,
    file,
    create: vi.fn().mockResolvedValue(created),
    onCreated: vi.fn(),
    onCancel: vi.fn(),
    ...overrides,
  };
  render(<SaveToTeamForm {...props} />);
  return props;
}

const save = () => fireEvent.click(screen.getByRole("button", { name: "Save as revision 1" }));

describe("Save to team form (issue 13 item 2)", () => {
  it("labels its fields and fills the name from the desk", () => {
    renderForm();
    expect(screen.getByLabelText("Team")).toHaveProperty("value", "");
    expect(screen.getByLabelText("Scenario name")).toHaveProperty("value", "Crash rib, transverse");
    expect(screen.getByLabelText("What this revision holds (revision message)")).toBeTruthy();
  });

  it("asks for a team and a name beside the fields, and creates nothing", async () => {
    const props = renderForm();
    fireEvent.change(screen.getByLabelText("Scenario name"), { target: { value: "   " } });
    save();
    expect(await screen.findByText("Choose the team that keeps the scenario.")).toBeTruthy();
    expect(screen.getByText("Give the scenario a name.")).toBeTruthy();
    expect(screen.getByLabelText("Scenario name").getAttribute("aria-describedby")).toBe(
      "save-name-error",
    );
    expect(props.create).not.toHaveBeenCalled();
  });

  it("creates revision 1 in the chosen team with the typed name and message", async () => {
    const create = vi.fn().mockResolvedValue(created);
    const props = renderForm({ create });
    fireEvent.change(screen.getByLabelText("Team"), { target: { value: "rig" } });
    fireEvent.change(screen.getByLabelText("Scenario name"), {
      target: { value: "  Rib, 90° cyclic  " },
    });
    fireEvent.change(screen.getByLabelText("What this revision holds (revision message)"), {
      target: { value: "From the sandbox" },
    });
    save();
    await waitFor(() => expect(props.onCreated).toHaveBeenCalledWith("rig", created));
    expect(create).toHaveBeenCalledTimes(1);
    const [slug, vars] = create.mock.calls[0] as [string, CreateScenarioVars];
    expect(slug).toBe("rig");
    expect(vars.name).toBe("Rib, 90° cyclic");
    expect(vars.message).toBe("From the sandbox");
    // The file's own name follows the form, and the path and sets are the desk's.
    expect(vars.file.name).toBe("Rib, 90° cyclic");
    expect(vars.file.desk).toEqual(file.desk);
    expect(vars.file.parameterSets).toEqual(file.parameterSets);
  });

  it("preselects the only team and shows the server's refusal beside the field", async () => {
    const create = vi
      .fn()
      .mockRejectedValue(new ApiError(400, "invalid:name", "Keep the name under 200 characters."));
    const props = renderForm({ teams: [teams[0]], create });
    expect(screen.getByLabelText("Team")).toHaveProperty("value", "demo");
    save();
    expect(await screen.findByText("Keep the name under 200 characters.")).toBeTruthy();
    expect(screen.getByLabelText("Scenario name").getAttribute("aria-invalid")).toBe("true");
    expect(props.onCreated).not.toHaveBeenCalled();
    expect(screen.getByRole("button", { name: "Save as revision 1" })).toHaveProperty(
      "disabled",
      false,
    );
  });

  it("tells an engineer with no team to edit in why, with a way to create one", () => {
    renderForm({ teams: [] });
    expect(screen.queryByRole("form", { name: "Save to team" })).toBeNull();
    expect(screen.getByText(/saving needs the editor or owner role/)).toBeTruthy();
    expect(screen.getByRole("link", { name: "Create a team" }).getAttribute("href")).toBe(
      "/teams#create-team",
    );
  });
});
