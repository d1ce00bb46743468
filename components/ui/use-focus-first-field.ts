'use client';

import { type RefObject, useEffect } from 'react';

const FIELD = 'input:not([type="hidden"]):not([disabled]):not(.sr-only), select:not([disabled]), textarea:not([disabled])';

// When a form opens at the maker's request, focus moves to its first field
// (once): a keyboard or screen-reader user lands where the work starts. The
// form may still be loading its options, so this waits for the field to appear.
export function useFocusFirstField(container: RefObject<HTMLElement | null>) {
  useEffect(() => {
    const el = container.current;
    if (!el) return;
    const tryFocus = () => {
      const field = el.querySelector<HTMLElement>(FIELD);
      if (!field) return false;
      field.focus({ preventScroll: false });
      return true;
    };
    if (tryFocus()) return;
    const mo = new MutationObserver(() => tryFocus() && mo.disconnect());
    mo.observe(el, { childList: true, subtree: true });
    const stop = window.setTimeout(() => mo.disconnect(), 15_000);
    return () => {
      mo.disconnect();
      window.clearTimeout(stop);
    };
  }, [container]);
}
