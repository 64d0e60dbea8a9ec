/**
 * Admission to the compute pool: counts the tasks each person and the whole instance have in
 * flight (running or queued) and refuses one more past either cap. Refusing at the door keeps
 * the queue short, so a task that is let in starts soon and one person cannot fill the pool.
 * Pure and synchronous: the pool calls `enter` before it hands a task to a thread.
 */
export type Admission =
  | { ok: true; leave: () => void }
  | { ok: false; reason: "person" | "instance"; retryAfterSeconds: number };

export class TaskGate {
  private total = 0;
  private readonly perPerson = new Map<string, number>();

  constructor(
    private readonly caps: {
      maxTasks: number;
      maxTasksPerPerson: number;
      retryAfterSeconds: number;
    },
  ) {}

  /** `person` null is the server's own work (no signed-in person): only the instance cap holds. */
  enter(person: string | null): Admission {
    const mine = person === null ? 0 : (this.perPerson.get(person) ?? 0);
    const retryAfterSeconds = this.caps.retryAfterSeconds;
    if (person !== null && mine >= this.caps.maxTasksPerPerson) {
      return { ok: false, reason: "person", retryAfterSeconds };
    }
    if (this.total >= this.caps.maxTasks)
      return { ok: false, reason: "instance", retryAfterSeconds };
    this.total++;
    if (person !== null) this.perPerson.set(person, mine + 1);
    let left = false;
    return {
      ok: true,
      leave: () => {
        if (left) return; // a task ends once, however many paths report its end
        left = true;
        this.total--;
        if (person === null) return;
        const now = (this.perPerson.get(person) ?? 1) - 1;
        if (now === 0) this.perPerson.delete(person);
        else this.perPerson.set(person, now);
      },
    };
  }

  inFlight(person?: string): number {
    return person === undefined ? this.total : (this.perPerson.get(person) ?? 0);
  }
}
