/**
 * Which clicks on a link would take the engineer away from unsaved desk edits. Links to other
 * sites, new tabs and downloads are left alone (the browser's own leave question covers a real
 * page unload); a jump within the same page is no leaving.
 */
export const LEAVE_QUESTION =
  "This scenario has unsaved changes. A draft stays in this browser, but the changes are not a revision yet. Leave anyway?";

export interface LinkClick {
  href: string;
  target: string;
  download: boolean;
  /** Ctrl, Meta, Shift or Alt held, or not the main button: the browser opens it elsewhere. */
  modified: boolean;
}

export function leavesThePage(click: LinkClick, here: string): boolean {
  if (click.modified || click.download) return false;
  if (click.target && click.target !== "_self") return false;
  let to: URL;
  let from: URL;
  try {
    to = new URL(click.href, here);
    from = new URL(here);
  } catch {
    return false;
  }
  if (to.origin !== from.origin) return false;
  return to.pathname !== from.pathname || to.search !== from.search;
}
