/**
 * What each test type of a record is called on screen and in print: the stored value is a short
 * code ("tension-1"), people read the test ("Tension along 1").
 */
import type { TestType } from "./record-schema";

export const TEST_TYPE_WORDS: Record<TestType, string> = {
  "tension-1": "Tension along 1",
  "tension-2": "Tension along 2",
  "compression-1": "Compression along 1",
  "shear-12": "In-plane shear 12",
  biaxial: "Biaxial",
  "transverse-after-damage-1": "Tension along 2 after damage along 1",
};

/** The words of a test type, lower-case inside a sentence ("cyclic tension along 1"). */
export function testTypeWords(type: string, inSentence = false): string {
  const words = (TEST_TYPE_WORDS as Record<string, string>)[type] ?? type;
  return inSentence ? words.charAt(0).toLowerCase() + words.slice(1) : words;
}
