import "server-only";

/** The upload's body: the file as text plus the mapping step's and the form's answers. */
import { z } from "zod";

import { recordMappingSchema } from "@/lib/csv/record-mapping";
import { testRecordMetaSchema } from "@/lib/csv/record-schema";

export const uploadTestRecordSchema = z.strictObject({
  name: z.string().trim().max(200, "Keep the name under 200 characters.").optional(),
  fileName: z
    .string()
    .trim()
    .min(1, "The file needs a name.")
    .max(255, "Keep the file name under 255 characters."),
  text: z.string({ error: "Send the file's text." }),
  mapping: recordMappingSchema,
  meta: testRecordMetaSchema,
});
export type UploadTestRecordInput = z.input<typeof uploadTestRecordSchema>;

/** "coupon-3.csv" → "coupon-3": the default record name. */
export function nameFromFile(fileName: string): string {
  return fileName.replace(/\.[A-Za-z0-9]{1,5}$/, "") || fileName;
}
