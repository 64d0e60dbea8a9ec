import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";

import type { CouponOrientation } from "@/lib/calibration/micromechanics/coupon-orientation";
import type { Conversion } from "@/lib/csv/convert-quantities";
import type { FileLayout } from "@/lib/csv/file-layout";
import type { Geometry } from "@/lib/csv/record-mapping";

import { teams } from "./teams";
import { users } from "./users";

/** Parsed channels of a test record in mm/mm and MPa (time as in the file), one entry per row. */
export interface StoredPoints {
  strain: number[];
  stress: number[];
  time?: number[];
  transverseStrain?: number[];
  shearStrain?: number[];
  shearStress?: number[];
}

/** The mapping step's answer as stored: column indices plus the units the reader applied. */
export interface StoredMapping {
  strain: number;
  stress: number;
  time?: number;
  transverseStrain?: number;
  shearStrain?: number;
  shearStress?: number;
  strainUnit: string;
  stressUnit: string;
  /** Force and extension columns of a machine file, when stress and strain were derived. */
  force?: number;
  extension?: number;
  conversion?: Conversion;
  geometry?: Geometry; // mm
  layout?: FileLayout; // how the file was read (older records: plain CSV, header on line 1)
}

// An uploaded coupon curve. The original file is kept beside the parsed points so every fit can
// be traced back to the bytes the engineer uploaded (its sha-256 says which ones).
export const testRecords = pgTable(
  "test_records",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    testType: text("test_type").notNull(),
    loading: text("loading").notNull(), // monotonic | cyclic
    specimenId: text("specimen_id").notNull(),
    orientation: doublePrecision("orientation").notNull().default(0), // degrees from axis 1
    strainRate: doublePrecision("strain_rate"), // 1/s
    temperature: doublePrecision("temperature"), // °C
    laboratory: text("laboratory"),
    notes: text("notes"),
    // The coupon's cut angle from the flow direction and its layer tensors (spec A.5), if known.
    couponOrientation: jsonb("coupon_orientation").$type<CouponOrientation>(),
    mapping: jsonb("mapping").$type<StoredMapping>().notNull(),
    headers: jsonb("headers").$type<string[]>().notNull(),
    warnings: jsonb("warnings").$type<string[]>().notNull().default([]),
    points: jsonb("points").$type<StoredPoints>().notNull(),
    pointCount: integer("point_count").notNull(),
    fileName: text("file_name").notNull(),
    fileSize: integer("file_size").notNull(), // bytes, UTF-8
    fileSha256: text("file_sha256").notNull(),
    fileText: text("file_text").notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("test_records_team_created_idx").on(t.teamId, t.createdAt)],
);

export type TestRecordRow = typeof testRecords.$inferSelect;
