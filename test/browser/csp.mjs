// Content-Security-Policy violations as test failures. The built app carries
// its policy as a meta tag (vite.config.ts); every page of a test's browser
// context reports each violation (the page's `securitypolicyviolation`
// event, and Chromium's own console message), and run.mjs fails the test
// when any was seen.

/** Watches every page of `context`; `take()` returns the violations so far and forgets them. */
export async function watchCsp(context) {
  let seen = [];
  await context.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      console.error(
        `CSP violation: ${e.effectiveDirective} refused ${e.blockedURI || 'an inline resource'}` +
          (e.sourceFile ? ` (${e.sourceFile}:${e.lineNumber})` : ''),
      );
    });
  });
  context.on('console', (message) => {
    const text = message.text();
    if (text.startsWith('CSP violation:') || /Content Security Policy/.test(text)) seen.push(text);
  });
  return {
    take() {
      const found = seen;
      seen = [];
      return found;
    },
    /** Throws, listing them, when the test caused any violation it did not take itself. */
    check() {
      const found = this.take();
      if (found.length > 0) throw new Error(`Content-Security-Policy violations:\n  ${found.join('\n  ')}`);
    },
  };
}
