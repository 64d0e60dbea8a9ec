import "server-only";

import { escapeMarkup as escapeHtml } from "@/lib/shared/escape-markup";

// Plain HTML that survives any mail client: one column, inline styles, our palette.

export function frameHtml(opts: {
  heading: string;
  paragraphs: string[];
  action: { label: string; url: string };
  footnote: string;
}): string {
  const p = opts.paragraphs
    .map((text) => `<p style="margin:0 0 16px">${escapeHtml(text)}</p>`)
    .join("");
  return `<!doctype html><html><body style="margin:0;background:#f7f3ea;font-family:system-ui,sans-serif;color:#1f2a30">
<div style="max-width:520px;margin:0 auto;padding:32px 24px">
<p style="margin:0 0 24px;font-weight:600;letter-spacing:.02em;color:#b4532a">Craquelure</p>
<h1 style="margin:0 0 16px;font-size:20px">${escapeHtml(opts.heading)}</h1>${p}
<p style="margin:24px 0"><a href="${escapeHtml(opts.action.url)}" style="background:#2f7a74;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(opts.action.label)}</a></p>
<p style="margin:0 0 16px;font-size:13px;color:#6b7a82">Or paste this address into your browser:<br>${escapeHtml(opts.action.url)}</p>
<p style="margin:0;font-size:13px;color:#6b7a82">${escapeHtml(opts.footnote)}</p>
</div></body></html>`;
}
