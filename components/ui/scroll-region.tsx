/**
 * A sideways-scrolling box for a wide table. It is a named region in the tab order, so a keyboard user
 * can reach it and scroll it with the arrow keys (WCAG 2.1.1); edge shadows (globals.css .scroll-cue)
 * show only while there is more to see, so a cut-off column is never hidden without a cue.
 */
export function ScrollRegion({ label, className = "", children }: { label: string; className?: string; children: React.ReactNode }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={`scroll-cue overflow-x-auto rounded focus:outline focus:outline-2 focus:outline-accent-700 ${className}`}>
      {children}
    </div>
  );
}
