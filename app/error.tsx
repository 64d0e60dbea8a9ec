"use client";

import { ErrorNotice } from "@/components/ui/error-notice";

// Catches what the group boundaries cannot: errors thrown by a group's own layout (the signed-in
// layout reads the session from the database, so an outage surfaces here).
export default function RootError({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  return <ErrorNotice digest={error.digest} onRetry={reset} />;
}
