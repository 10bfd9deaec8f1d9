import { useEffect, useRef, useState, type RefObject } from "react";
import { useLocation } from "react-router";

/**
 * After a move to another page (a new path; not a change of the query, which the configurator and the
 * cam check make as you type, nor of the #hash), keyboard focus goes to the new page's main heading, or
 * to the main landmark while the page has no heading yet, and the page's title is announced, so keyboard
 * and screen-reader users know the page changed. The first page of a visit is left to the browser.
 *
 * A page that shows its heading only once its data has arrived (the configurator) gets the focus moved
 * on to that heading when it appears, as long as the person has not moved the focus themselves; a title
 * set late is announced when it is set.
 *
 * @returns the text for a polite live region: the page's document title.
 */
export function useRouteFocus(mainRef: RefObject<HTMLElement | null>): string {
  const { pathname } = useLocation();
  const [announcement, setAnnouncement] = useState("");
  const first = useRef(true);

  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    const main = mainRef.current;
    if (!main) return;
    setAnnouncement(document.title);

    const heading = () => main.querySelector("h1");
    const focusHeading = (h1: HTMLElement) => {
      // A heading is not focusable by itself; -1 lets a script focus it without adding a tab stop.
      if (!h1.hasAttribute("tabindex")) h1.setAttribute("tabindex", "-1");
      h1.focus();
    };
    const now = heading();
    if (now) focusHeading(now);
    else main.focus();

    const observers: MutationObserver[] = [];
    if (!now) {
      const waitForHeading = new MutationObserver(() => {
        const h1 = heading();
        if (!h1) return;
        waitForHeading.disconnect();
        if (document.activeElement === main) focusHeading(h1);
      });
      waitForHeading.observe(main, { childList: true, subtree: true });
      observers.push(waitForHeading);
    }
    const titleElement = document.querySelector("head > title");
    if (titleElement) {
      const followTitle = new MutationObserver(() => setAnnouncement(document.title));
      followTitle.observe(titleElement, { childList: true, characterData: true, subtree: true });
      observers.push(followTitle);
    }
    return () => {
      for (const o of observers) o.disconnect();
    };
  }, [pathname, mainRef]);

  return announcement;
}

/** Says the new page's title to screen readers (visually hidden; polite, whole text each time). */
export function RouteAnnouncer({ text }: { text: string }) {
  return (
    <div
      role="status"
      aria-live="polite"
      aria-atomic="true"
      className="sr-only"
      data-testid="route-announcer"
    >
      {text}
    </div>
  );
}
