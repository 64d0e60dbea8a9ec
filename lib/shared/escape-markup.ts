/**
 * Text typed by people, made safe inside HTML or Plotly's title markup: the five characters that
 * could open a tag, an entity or an attribute become entities. Used by the e-mail templates and
 * the saved-image stamp, so a scenario named `<b>` prints as typed everywhere. Quotes are numeric
 * entities because Plotly decodes numeric ones but knows no `&quot;`.
 */
export function escapeMarkup(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&#34;")
    .replace(/'/g, "&#39;");
}
