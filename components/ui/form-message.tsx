export interface FormMessageProps {
  tone: "error" | "success" | "info";
  children: React.ReactNode;
}

const TONES = {
  error: "border-kiln/40 bg-kiln-light text-kiln-dark",
  success: "border-verdigris/40 bg-verdigris-light text-verdigris-dark",
  info: "border-glaze-line bg-glaze-deep text-ink-soft",
};

/** A message about the whole form (not one field): announced to screen readers. */
export function FormMessage({ tone, children }: FormMessageProps) {
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={`rounded-md border px-3 py-2 text-sm ${TONES[tone]}`}
    >
      {children}
    </div>
  );
}
