import { cssString } from "@/lib/shared/css-string";

/**
 * Print margins that carry the revision stamp and the page number on every printed page (CSS
 * page-margin boxes). No paper size is forced: the same margins fit A4 and US Letter, and the
 * print dialog's choice applies.
 */
export function PageStamp({ stamp, footer }: { stamp: string; footer: string }) {
  const css = `@page {
  margin: 18mm 14mm 18mm 14mm;
  @top-left { content: ${cssString(stamp)}; font: 8pt sans-serif; color: #3b4a52; }
  @bottom-left { content: ${cssString(footer)}; font: 8pt sans-serif; color: #3b4a52; }
  @bottom-right { content: "Page " counter(page) " of " counter(pages); font: 8pt sans-serif; color: #3b4a52; }
}
@media print {
  html, body { background: #ffffff !important; }
}`;
  return <style>{css}</style>;
}
