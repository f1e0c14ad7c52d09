// @ts-nocheck
import { useEffect, useRef, useState } from 'react';

/** The Observable Plot module, loaded on first use so it stays out of the main bundle. */
export type PlotModule = typeof import('@observablehq/plot');

let plotModule: Promise<PlotModule> | null = null;

export function loadPlot(): Promise<PlotModule> {
  plotModule ??= import('@observablehq/plot');
  return plotModule;
}

export interface PlotFigureProps {
  /**
   * Builds the figure for the measured width. Keep it stable (useCallback/useMemo) so the figure is
   * rebuilt only when its data or options change.
   */
  render: (Plot: PlotModule, widthPx: number) => Element | null;
  /** Accessible name of the figure; the text alternative sits next to it. */
  label: string;
  /** Height held while Plot loads, so the page does not jump. */
  placeholderHeightPx?: number;
  className?: string;
}

/**
 * Makes each svg of a Plot figure one named image. Plot names every mark group with `aria-label` ("dot", "rule"),
 * which screen readers read as noise and accessibility checkers refuse on an element without a role; the figure's
 * name and the table beside every chart carry its meaning. The mark's name stays as `data-mark` for tests and styling.
 */
export function asOneImage(figure: Element, label: string): void {
  const svgs = figure.matches('svg') ? [figure] : Array.from(figure.querySelectorAll('svg'));
  for (const svg of svgs) {
    svg.setAttribute('role', 'img');
    if (!svg.hasAttribute('aria-label')) svg.setAttribute('aria-label', label);
    quietMarks(svg);
    // Plot draws a pointer's tip again on each move, named as before: keep those quiet too.
    if (typeof MutationObserver !== 'undefined') new MutationObserver(() => quietMarks(svg)).observe(svg, { childList: true, subtree: true });
  }
}

function quietMarks(svg: Element): void {
  for (const mark of svg.querySelectorAll('[aria-label]')) {
    mark.setAttribute('data-mark', mark.getAttribute('aria-label')!);
    mark.removeAttribute('aria-label');
  }
}

/** Renders a Plot figure into a div, follows the div's width, and removes the figure on change or unmount. */
export function PlotFigure({ render, label, placeholderHeightPx = 320, className }: PlotFigureProps) {
  const host = useRef<HTMLDivElement>(null);
  const [widthPx, setWidthPx] = useState(0);
  const [state, setState] = useState<'loading' | 'ready' | 'error'>('loading');

  useEffect(() => {
    const element = host.current;
    if (!element) return;
    // Rounded to 16 px so a scroll bar appearing or a pixel of rounding does not rebuild the figure.
    const settle = (widthPx: number) => setWidthPx(Math.max(280, Math.floor(widthPx / 16) * 16));
    settle(element.clientWidth || 640);
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => settle(entry.contentRect.width));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  useEffect(() => {
    if (!widthPx) return;
    let cancelled = false;
    let figure: Element | null = null;
    loadPlot()
      .then((Plot) => {
        if (cancelled || !host.current) return;
        figure = render(Plot, widthPx);
        if (figure) asOneImage(figure, label);
        host.current.replaceChildren(...(figure ? [figure] : []));
        setState('ready');
      })
      .catch(() => !cancelled && setState('error'));
    return () => {
      cancelled = true;
      figure?.remove();
    };
  }, [render, widthPx, label]);

  return (
    <figure aria-label={label} className={className}>
      {state === 'loading' && (
        <div role="progressbar" aria-label={`Loading chart: ${label}`} className="animate-pulse rounded bg-mist" style={{ height: placeholderHeightPx }} />
      )}
      {state === 'error' && (
        <p role="alert" className="rounded border border-signal-bad/40 bg-[#fbeceb] p-3 text-sm">
          The chart could not be drawn. Reload the page; the table below holds the same figures.
        </p>
      )}
      <div ref={host} className="w-full overflow-hidden [&_svg]:max-w-full" />
    </figure>
  );
}
