/**
 * Parser of the path notation (documented on the sandbox page):
 *
 *   # a note
 *   ε11=1% over 100            one leg: strain 11 to 1 %, free directions held at zero stress
 *   σ11=0 over 50              unload to zero stress (ASCII: stress11=0 over 50)
 *   repeat 5 grow 0.5          a block run 5 times, cycle k scaled by (1 + 0.5·k)
 *     ε11=0.4% over 60
 *     σ11=0 over 60
 *   end
 *
 * Component names: see components.ts (symbols, ASCII words, and version 1's e11/s11 with "in",
 * still read). Errors carry 1-based line and column.
 */
import type { Leg } from "@/lib/mechanics/types";
import {
  COMPONENT_NAMES,
  componentHint,
  INCREMENTS_WORD,
  VERSION1_INCREMENTS_WORD,
} from "./components";
import { MAX_PATH_INCREMENTS, type PathDoc, type PathItem, totalIncrements } from "./path-doc";
import { type Token, tokenizeLine } from "./tokenize";

export interface PathTextError {
  line: number;
  column: number;
  message: string;
}

export type ParsePathResult = { ok: true; doc: PathDoc } | { ok: false; errors: PathTextError[] };

class LineError extends Error {
  constructor(
    readonly column: number,
    message: string,
  ) {
    super(message);
  }
}

const MAX_REPEAT = 10_000;

function readInteger(tok: Token | undefined, endColumn: number, what: string, max: number) {
  if (!tok) throw new LineError(endColumn, `expected ${what} (a whole number) here`);
  const n = Number(tok.text);
  if (tok.kind !== "number" || !Number.isInteger(n) || n < 1 || n > max)
    throw new LineError(
      tok.column,
      `${what} must be a whole number from 1 to ${max}, got "${tok.text}"`,
    );
  return n;
}

const isIncrementsWord = (t: Token) =>
  t.kind === "word" && (t.text === INCREMENTS_WORD || t.text === VERSION1_INCREMENTS_WORD);

/** Parses "ε11=0.01 σ22=0 over 100" (commas between terms allowed). */
function parseLeg(tokens: Token[], endColumn: number): Leg {
  const control: Leg["control"] = ["stress", "stress", "stress"];
  const target: Leg["target"] = [0, 0, 0];
  const seen: (number | null)[] = [null, null, null];
  let i = 0;
  while (i < tokens.length && !isIncrementsWord(tokens[i])) {
    const t = tokens[i];
    if (t.kind === "symbol" && t.text === ",") {
      i++;
      continue;
    }
    const comp = t.kind === "word" ? COMPONENT_NAMES[t.text] : undefined;
    if (!comp)
      throw new LineError(t.column, `unknown component "${t.text}": ${componentHint(t.text)}`);
    if (seen[comp.index] !== null)
      throw new LineError(
        t.column,
        `direction ${["11", "22", "12"][comp.index]} is prescribed twice in this leg`,
      );
    const eq = tokens[i + 1];
    if (!eq || eq.text !== "=")
      throw new LineError(eq?.column ?? endColumn, `expected "=" after ${t.text}`);
    const num = tokens[i + 2];
    if (!num || num.kind !== "number")
      throw new LineError(num?.column ?? endColumn, `expected a number after ${t.text}=`);
    let value = Number(num.text);
    i += 3;
    if (tokens[i]?.text === "%") {
      if (comp.control === "stress")
        throw new LineError(
          tokens[i].column,
          `"%" applies to strains only; ${t.text} is a stress in MPa`,
        );
      value /= 100;
      i++;
    }
    if (!Number.isFinite(value))
      throw new LineError(num.column, `"${num.text}" is not a finite number`);
    control[comp.index] = comp.control;
    target[comp.index] = value;
    seen[comp.index] = t.column;
  }
  if (seen.every((s) => s === null))
    throw new LineError(
      tokens[0]?.column ?? endColumn,
      "a leg needs at least one target, e.g. ε11=1% over 100",
    );
  if (i >= tokens.length)
    throw new LineError(endColumn, 'expected "over <increments>" at the end of the leg');
  const increments = readInteger(
    tokens[i + 1],
    endColumn,
    "the number of increments",
    MAX_PATH_INCREMENTS,
  );
  if (tokens[i + 2])
    throw new LineError(
      tokens[i + 2].column,
      `unexpected "${tokens[i + 2].text}" after the increments`,
    );
  return { control, target, increments };
}

function parseRepeatHead(tokens: Token[], endColumn: number) {
  const count = readInteger(tokens[1], endColumn, "the repeat count", MAX_REPEAT);
  let grow = 0;
  if (tokens[2]) {
    if (tokens[2].text !== "grow")
      throw new LineError(
        tokens[2].column,
        `expected "grow <factor>" or the end of the line, got "${tokens[2].text}"`,
      );
    const g = tokens[3];
    if (!g || g.kind !== "number")
      throw new LineError(g?.column ?? endColumn, 'expected a number after "grow"');
    grow = Number(g.text);
    if (tokens[4]) throw new LineError(tokens[4].column, `unexpected "${tokens[4].text}"`);
  }
  return { count, grow };
}

export function parsePathText(text: string): ParsePathResult {
  const errors: PathTextError[] = [];
  const items: PathItem[] = [];
  let open: { line: number; item: Extract<PathItem, { kind: "repeat" }> } | null = null;
  const lines = text.split(/\r?\n/);
  lines.forEach((raw, index) => {
    const line = index + 1;
    const { tokens, badColumn, badChar } = tokenizeLine(raw);
    try {
      if (badColumn !== null) throw new LineError(badColumn, `unexpected character "${badChar}"`);
      if (tokens.length === 0) return;
      const head = tokens[0];
      const endColumn = raw.trimEnd().length + 1;
      if (head.kind === "word" && head.text === "repeat") {
        if (open)
          throw new LineError(
            head.column,
            `a repeat block cannot hold another; close the one of line ${open.line} with "end" first`,
          );
        const { count, grow } = parseRepeatHead(tokens, endColumn);
        open = { line, item: { kind: "repeat", block: { count, grow, legs: [] } } };
      } else if (head.kind === "word" && head.text === "end") {
        if (!open) throw new LineError(head.column, '"end" without a "repeat" above it');
        if (tokens[1])
          throw new LineError(tokens[1].column, `unexpected "${tokens[1].text}" after "end"`);
        if (open.item.block.legs.length === 0)
          throw new LineError(head.column, `the repeat block of line ${open.line} has no legs`);
        const { count, grow, legs } = open.item.block;
        const last = 1 + grow * (count - 1);
        if (!legs.every((l) => l.target.every((v) => Number.isFinite(v * last))))
          errors.push({
            line: open.line,
            column: 1,
            message: `"grow ${grow}" makes the targets of the last cycle too large to compute`,
          });
        items.push(open.item);
        open = null;
      } else {
        const leg = parseLeg(tokens, endColumn);
        if (open) open.item.block.legs.push(leg);
        else items.push({ kind: "leg", leg });
      }
    } catch (e) {
      if (!(e instanceof LineError)) throw e;
      errors.push({ line, column: e.column, message: e.message });
    }
  });
  if (open) {
    const o = open as { line: number };
    errors.push({
      line: o.line,
      column: 1,
      message: 'this repeat block is never closed with "end"',
    });
  }
  if (errors.length === 0 && items.length === 0)
    errors.push({
      line: 1,
      column: 1,
      message: "the path is empty: write at least one leg, e.g. ε11=1% over 100",
    });
  if (errors.length > 0) return { ok: false, errors };
  const doc = { items };
  const total = totalIncrements(doc);
  if (total > MAX_PATH_INCREMENTS)
    return {
      ok: false,
      errors: [
        {
          line: 1,
          column: 1,
          message: `the path has ${total} increments; the limit is ${MAX_PATH_INCREMENTS}`,
        },
      ],
    };
  return { ok: true, doc };
}

/** "line 3, column 5: …" */
export function formatPathTextError(e: PathTextError): string {
  return `line ${e.line}, column ${e.column}: ${e.message}`;
}
