/**
 * "Skip to content": the first focusable element on every page, so a keyboard user reaches the page's
 * own content in one tab instead of walking the whole menu. Hidden until it has focus.
 */
export function SkipLink({ target = "content" }: { target?: string }) {
  return (
    <a
      href={`#${target}`}
      className="sr-only rounded-md bg-white px-3 py-2 text-sm font-medium text-accent-800 shadow focus:not-sr-only focus:fixed focus:left-3 focus:top-3 focus:z-50 focus:outline focus:outline-2 focus:outline-accent-700"
    >
      Skip to content
    </a>
  );
}
