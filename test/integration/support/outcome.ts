import { isAppError } from "@/lib/shared/errors";

/** null when the call succeeded, else the expected error's code; unexpected errors propagate. */
export async function outcome(promise: Promise<unknown>): Promise<string | null> {
  try {
    await promise;
    return null;
  } catch (error) {
    if (isAppError(error)) return error.code;
    throw error;
  }
}

/** The field an expected error points at (for "message beside the field"). */
export async function failedField(promise: Promise<unknown>): Promise<string | undefined> {
  try {
    await promise;
  } catch (error) {
    if (isAppError(error)) return error.field;
    throw error;
  }
  throw new Error("expected the call to fail");
}
