/** The first focusable element: jumps past the header to `<main id="main">`. */
export function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only rounded-md bg-sand-50 px-4 py-2 font-bold text-ink-900 focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50"
    >
      Skip to content
    </a>
  );
}
