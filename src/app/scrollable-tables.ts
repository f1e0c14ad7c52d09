import { useEffect } from 'react';

/**
 * Makes every table that scrolls sideways inside `main` (on a phone, wide tables scroll in their own box; see
 * index.css) reachable with the keyboard: such a table gets `tabindex="0"` so arrow keys can scroll it, and loses it
 * again when it fits. Tables appear as data loads, so the check runs after changes under `main`, at most once a frame,
 * and again when a web font has loaded: the fonts swap in after the first paint (font-display: swap) and widen text
 * without any change under `main`, so a table checked in the fallback font may scroll once the font arrives.
 */
export function useScrollableTablesFocusable(): void {
  useEffect(() => {
    const main = document.getElementById('main');
    if (!main) return;
    let frame = 0;
    const check = () => {
      frame = 0;
      for (const table of main.querySelectorAll('table')) {
        const scrolls = table.scrollWidth > table.clientWidth + 1;
        if (scrolls && table.getAttribute('tabindex') !== '0') table.setAttribute('tabindex', '0');
        if (!scrolls && table.getAttribute('tabindex') === '0') table.removeAttribute('tabindex');
      }
    };
    const schedule = () => {
      if (!frame) frame = requestAnimationFrame(check);
    };
    const observer = new MutationObserver(schedule);
    observer.observe(main, { childList: true, subtree: true });
    window.addEventListener('resize', schedule);
    document.fonts?.addEventListener('loadingdone', schedule);
    schedule();
    return () => {
      observer.disconnect();
      window.removeEventListener('resize', schedule);
      document.fonts?.removeEventListener('loadingdone', schedule);
      if (frame) cancelAnimationFrame(frame);
    };
  }, []);
}
