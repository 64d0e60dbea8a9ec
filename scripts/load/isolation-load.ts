/**
 * The heavy half of bench:isolation: 4 clients each running the largest path the API takes, one
 * loading the calibration report and one posting a 100,000-row conformance check, each in a loop
 * until the end time. They stand for remote users: the bench runs them in a child process of
 * their own at lower priority (isolation-load-child.ts), so on the bench's one machine their own
 * CPU (reading 4 × ~100 MB of run output) does not hold the cores the server under test needs,
 * as it would not on a real deployment where clients sit on other machines.
 */
import { readFileSync } from "node:fs";
import path from "node:path";

import { sleep } from "./app-process";

export const RUN_CLIENTS = 4;
const HISTORY_ROWS = 100_000;

/** 1,000,000 increments (the API's limit) of tension cycles below failure, in six sets. */
export function largestFile() {
  const file = JSON.parse(
    readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
  );
  const leg = (target: number) => ({
    control: ["strain", "stress", "stress"],
    target: [target, 0, 0],
    increments: 250_000,
  });
  file.path.legs = [leg(0.006), leg(0), leg(0.006), leg(0)];
  // Six sets, the loading desk's most: the report runs the path once per set.
  file.parameterSets = [1, 2, 3, 4, 5, 6].map((i) => ({
    ...file.parameterSets[0],
    id: `S${i}`,
    E1: 10_000 + 200 * i,
  }));
  return file;
}

/** A uniaxial strain ramp in the contract's columns; its stresses are invented (the check fails). */
function historyCsv(): string {
  const lines = ["increment,eps11,eps22,gam12,sig11,sig22,sig12"];
  for (let i = 0; i < HISTORY_ROWS; i++) {
    const e = (0.006 * i) / HISTORY_ROWS;
    lines.push(`${i},${e},${-0.3 * e},0,${11_000 * e},0,0`);
  }
  return lines.join("\n") + "\n";
}

export interface HeavyLoad {
  base: string;
  /** Date.now() at which the clients stop starting requests. */
  until: number;
  teamSlug: string;
  scenarioId: string;
  /** One session cookie per client: RUN_CLIENTS run clients, then the report's, the conformance's. */
  cookies: string[];
}

export interface HeavyResult {
  statuses: Record<string, number>;
  runsOk: number;
  /** CPU seconds the clients' process used (all its threads). */
  cpuSeconds: number;
}

export async function runHeavyLoad(load: HeavyLoad): Promise<HeavyResult> {
  const { base, until, cookies } = load;
  const file = largestFile();
  const history = historyCsv();
  const cpuBefore = process.cpuUsage();
  const statuses: Record<string, number> = {};
  const count = (what: string, status: number | "cut") => {
    const key = `${what} ${status}`;
    statuses[key] = (statuses[key] ?? 0) + 1;
  };
  /** One request, read to its end; a stream cut by the server (a run over budget) counts as "cut". */
  const send = async (what: string, url: string, init: RequestInit): Promise<number> => {
    try {
      const res = await fetch(url, init);
      const bytes = (await res.arrayBuffer()).byteLength;
      count(what, res.status);
      return res.status === 200 && bytes > 0 ? 200 : res.status;
    } catch {
      count(what, "cut");
      return 0;
    }
  };
  let runsOk = 0;
  const runClient = async (cookie: string) => {
    while (Date.now() < until) {
      // The whole body is read: a run is only done once its output has arrived.
      const status = await send("run", `${base}/api/v1/runs`, {
        method: "POST",
        headers: { cookie, "content-type": "application/json", origin: base },
        body: JSON.stringify({ scenario: file, format: "csv" }),
      });
      if (status === 200) runsOk++;
      if (status === 429 || status === 503) await sleep(1000);
    }
  };
  const reportClient = async (cookie: string) => {
    while (Date.now() < until) {
      await send("report", `${base}/reports/${load.teamSlug}/${load.scenarioId}/1`, {
        headers: { cookie },
      });
    }
  };
  const conformanceClient = async (cookie: string) => {
    const url = `${base}/api/v1/teams/${load.teamSlug}/scenarios/${load.scenarioId}/revisions/1/conformance`;
    while (Date.now() < until) {
      await send("conformance", url, {
        method: "POST",
        headers: { cookie, "content-type": "application/json", origin: base },
        body: JSON.stringify({ fileName: "bench-history.csv", text: history, set: "S1" }),
      });
    }
  };
  await Promise.all([
    ...cookies.slice(0, RUN_CLIENTS).map(runClient),
    reportClient(cookies[RUN_CLIENTS]),
    conformanceClient(cookies[RUN_CLIENTS + 1]),
  ]);
  const cpu = process.cpuUsage(cpuBefore);
  return { statuses, runsOk, cpuSeconds: (cpu.user + cpu.system) / 1e6 };
}
