import path from "node:path";

import { ESLint } from "eslint";
import { describe, expect, it, vi } from "vitest";

// A time limit, not a speed goal: each case starts ESLint with the project's type-aware config,
// which alone can take 15 s on a busy machine.
vi.setConfig({ testTimeout: 60000 });

// The walls between the bands of lib/ live in eslint.config.mjs; this lints invented source
// text at invented paths through the real config, so a wall that stops working fails here.
const eslint = new ESLint({ cwd: path.resolve(__dirname, "../../..") });

async function wallErrors(code: string, filePath: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return result.messages
    .filter((m) => m.ruleId === "@typescript-eslint/no-restricted-imports")
    .map((m) => m.message);
}

describe("import walls", () => {
  it("refuse the database in the pure mechanics", async () => {
    const errors = await wallErrors(
      'import { db } from "@/db";\nexport const x = db;\n',
      "lib/mechanics/x.ts",
    );
    expect(errors).toHaveLength(1);
  });

  it("let mechanics import itself", async () => {
    const code =
      'import type { MaterialParams } from "@/lib/mechanics/types";\nexport type X = MaterialParams;\n';
    expect(await wallErrors(code, "lib/mechanics/x.ts")).toEqual([]);
  });

  it("refuse a server value in a client file but allow its type", async () => {
    const value =
      'import { authorizeTeam } from "@/lib/server/access/team-access";\nexport const x = authorizeTeam;\n';
    const type =
      'import type { TeamContext } from "@/lib/server/access/team-access";\nexport type X = TeamContext;\n';
    expect(await wallErrors(value, "lib/client/data/x.ts")).toHaveLength(1);
    expect(await wallErrors(type, "lib/client/data/x.ts")).toEqual([]);
  });

  it("refuse React in lib/shared and client code in lib/server", async () => {
    const react = 'import { useState } from "react";\nexport const x = useState;\n';
    const client =
      'import { PRESETS } from "@/lib/client/loading-desk/presets";\nexport const x = PRESETS;\n';
    expect(await wallErrors(react, "lib/shared/x.ts")).toHaveLength(1);
    expect(await wallErrors(client, "lib/server/x.ts")).toHaveLength(1);
  });

  it("let the core folders import mechanics and shared only", async () => {
    const ok =
      'import { AppError } from "@/lib/shared/errors";\nimport type { MaterialParams } from "@/lib/mechanics/types";\nexport type X = MaterialParams;\nexport const y = AppError;\n';
    const bad = 'import { getDb } from "@/db";\nexport const x = getDb;\n';
    expect(await wallErrors(ok, "lib/calibration/x.ts")).toEqual([]);
    expect(await wallErrors(bad, "lib/calibration/x.ts")).toHaveLength(1);
  });
});
