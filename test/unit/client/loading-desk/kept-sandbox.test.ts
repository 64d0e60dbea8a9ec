import { describe, expect, it } from "vitest";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import {
  forgetKeptSandboxScenario,
  KEPT_SANDBOX_KEY,
  type KeepStorage,
  keepSandboxScenario,
  readKeptSandboxScenario,
} from "@/lib/client/loading-desk/kept-sandbox";

function memoryStorage(): KeepStorage & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return {
    map,
    getItem: (k) => map.get(k) ?? null,
    setItem: (k, v) => void map.set(k, v),
    removeItem: (k) => void map.delete(k),
  };
}

const at = new Date("2026-12-04T19:00:00.000Z");
const later = (ms: number) => new Date(at.getTime() + ms);
const typedPath = "tension 22 to 0.02 in 40\nunload in 20\n";
const edited = {
  ...defaultScenario(),
  name: "Crash rib, transverse",
  desk: { pathText: typedPath, hidden: [] },
};

describe("sandbox work kept across sign-in (issue 13 item 2)", () => {
  it("gives back the same name and typed path text after sign-in", () => {
    const storage = memoryStorage();
    expect(keepSandboxScenario(storage, edited, at)).toBe(true);
    const back = readKeptSandboxScenario(storage, later(60_000));
    expect(back?.name).toBe("Crash rib, transverse");
    expect((back?.desk as { pathText: string }).pathText).toBe(typedPath);
  });

  it("reads without emptying the slot, and reads nothing once forgotten", () => {
    const storage = memoryStorage();
    keepSandboxScenario(storage, edited, at);
    expect(readKeptSandboxScenario(storage, later(1))?.name).toBe("Crash rib, transverse");
    expect(readKeptSandboxScenario(storage, later(2))?.name).toBe("Crash rib, transverse");
    forgetKeptSandboxScenario(storage);
    expect(storage.map.has(KEPT_SANDBOX_KEY)).toBe(false);
    expect(readKeptSandboxScenario(storage, later(3))).toBeNull();
  });

  it("keeps one slot: a second keep replaces the first", () => {
    const storage = memoryStorage();
    keepSandboxScenario(storage, edited, at);
    keepSandboxScenario(storage, { ...edited, name: "Second try" }, later(1));
    expect(storage.map.size).toBe(1);
    expect(readKeptSandboxScenario(storage, later(2))?.name).toBe("Second try");
  });

  it("ignores work older than a day, damaged values and invalid files", () => {
    const storage = memoryStorage();
    keepSandboxScenario(storage, edited, at);
    expect(readKeptSandboxScenario(storage, later(25 * 60 * 60 * 1000))).toBeNull();

    storage.setItem(KEPT_SANDBOX_KEY, "{not json");
    expect(readKeptSandboxScenario(storage, at)).toBeNull();

    const badSet = { ...edited, parameterSets: [{ ...edited.parameterSets[0], E1: "stiff" }] };
    storage.setItem(KEPT_SANDBOX_KEY, JSON.stringify({ keptAt: at.toISOString(), file: badSet }));
    expect(readKeptSandboxScenario(storage, at)).toBeNull();
  });

  it("says so when the browser refuses storage, and reads nothing from a refusing one", () => {
    const refusing: KeepStorage = {
      getItem: () => {
        throw new Error("denied");
      },
      setItem: () => {
        throw new Error("quota");
      },
      removeItem: () => {
        throw new Error("denied");
      },
    };
    expect(keepSandboxScenario(refusing, edited, at)).toBe(false);
    expect(readKeptSandboxScenario(refusing, at)).toBeNull();
    expect(() => forgetKeptSandboxScenario(refusing)).not.toThrow();
  });
});
