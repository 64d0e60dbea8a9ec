"use client";

export function PrintButton() {
  return (
    <button
      type="button"
      onClick={() => window.print()}
      className="rounded-md bg-verdigris px-4 py-2 text-sm font-medium text-white hover:bg-verdigris-dark print:hidden"
    >
      Print or save as PDF
    </button>
  );
}
