import { methodPartHtml, type MethodPart } from '@/lib/method-doc';

/** A part of docs/method.md, rendered from the file as built (the method is written there, not here). */
export function MethodText({ part, className = '' }: { part: MethodPart; className?: string }) {
  // The HTML comes from the repository's own docs/method.md, rendered by marked at page load: trusted text, no script.
  return <div className={`method-text ${className}`} data-method-part={part} dangerouslySetInnerHTML={{ __html: methodPartHtml(part) }} />;
}
