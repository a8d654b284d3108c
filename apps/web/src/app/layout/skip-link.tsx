/** The first focusable element: jumps past the header to `<main id="main">`. */
export function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only rounded-md bg-sand-50 font-bold text-ink-900 shadow-card focus:not-sr-only focus:fixed focus:top-3 focus:left-3 focus:z-50 focus:px-4 focus:py-2"
    >
      Skip to content
    </a>
  );
}
