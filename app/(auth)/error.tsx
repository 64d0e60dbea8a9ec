"use client";

import { ErrorNotice } from "@/components/ui/error-notice";

export default function GroupError({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  return <ErrorNotice digest={error.digest} onRetry={reset} />;
}
