import { describe, expect, it } from "vitest";

import { TaskGate } from "@/lib/server/compute/task-gate";

const caps = { maxTasks: 3, maxTasksPerPerson: 2, retryAfterSeconds: 7 };

function admitted(gate: TaskGate, person: string | null) {
  const a = gate.enter(person);
  if (!a.ok) throw new Error(`refused: ${a.reason}`);
  return a.leave;
}

describe("TaskGate", () => {
  it("refuses a person's task past their cap with reason person and the retry delay", () => {
    const gate = new TaskGate(caps);
    admitted(gate, "ana");
    admitted(gate, "ana");
    expect(gate.enter("ana")).toEqual({ ok: false, reason: "person", retryAfterSeconds: 7 });
    // Someone else still gets in: the cap is per person.
    expect(gate.enter("ben").ok).toBe(true);
  });

  it("refuses anyone past the instance cap with reason instance", () => {
    const gate = new TaskGate(caps);
    admitted(gate, "ana");
    admitted(gate, "ben");
    admitted(gate, null);
    expect(gate.enter("cleo")).toEqual({ ok: false, reason: "instance", retryAfterSeconds: 7 });
    expect(gate.inFlight()).toBe(3);
  });

  it("frees the place when a task leaves, once however often leave is called", () => {
    const gate = new TaskGate(caps);
    const leave = admitted(gate, "ana");
    admitted(gate, "ana");
    leave();
    leave();
    expect(gate.inFlight("ana")).toBe(1);
    expect(gate.inFlight()).toBe(1);
    expect(gate.enter("ana").ok).toBe(true);
    expect(gate.enter("ana").ok).toBe(false);
  });

  it("counts server work (no person) against the instance only", () => {
    const gate = new TaskGate({ ...caps, maxTasksPerPerson: 1 });
    admitted(gate, null);
    admitted(gate, null);
    expect(gate.enter(null).ok).toBe(true);
    expect(gate.enter(null)).toMatchObject({ ok: false, reason: "instance" });
  });
});
