"use client";
import { useEffect } from "react";

/**
 * Opens the page at its top, so that the tag code, the first thing on an item's page, shows
 * under the phone's top bar. The router keeps the old scroll when the new page's top is
 * already "in view" (under the sticky bar, it is not); a link to an entry (#event-…) is left alone.
 */
export function OpensAtTop() {
  useEffect(() => {
    if (!window.location.hash) window.scrollTo(0, 0);
  }, []);
  return null;
}
