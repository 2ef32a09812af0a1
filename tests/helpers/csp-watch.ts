/**
 * Records every Content-Security-Policy violation a page reports (`securitypolicyviolation`
 * events, sent to Node so they survive reloads) and the console errors and uncaught exceptions
 * it logs. Call before the first page.goto().
 */
import type { Page } from 'playwright-core';

export interface CspWatch {
  /** "directive blocked-URI source:line sample", one per violation. */
  violations: string[];
  /** Console errors whose text mentions the Content Security Policy. */
  cspConsoleErrors: string[];
  consoleErrors: string[];
  pageErrors: string[];
}

export async function watchCsp(page: Page): Promise<CspWatch> {
  const watch: CspWatch = {
    violations: [],
    cspConsoleErrors: [],
    consoleErrors: [],
    pageErrors: [],
  };
  await page.exposeFunction('__thermoshiftCspViolation', (v: string) => watch.violations.push(v));
  await page.addInitScript(() => {
    const report = (window as unknown as { __thermoshiftCspViolation: (v: string) => void })
      .__thermoshiftCspViolation;
    document.addEventListener('securitypolicyviolation', (e) =>
      report(
        `${e.effectiveDirective} ${e.blockedURI || '(inline)'} ${e.sourceFile}:${e.lineNumber} ${e.sample}`,
      ),
    );
  });
  page.on('console', (m) => {
    if (m.type() !== 'error') return;
    watch.consoleErrors.push(m.text());
    if (/Content Security Policy/i.test(m.text())) watch.cspConsoleErrors.push(m.text());
  });
  page.on('pageerror', (e) => watch.pageErrors.push(e.message));
  return watch;
}

/** The policy of the page's CSP meta tag, as a map from directive to its sources. */
export function parseCsp(policy: string): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const part of policy.split(';')) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) out.set(name.toLowerCase(), sources);
  }
  return out;
}

/** The content of the CSP meta tag in an HTML text, or null. */
export function cspOfHtml(html: string): string | null {
  return /http-equiv="Content-Security-Policy"[^>]*content="([^"]*)"/i.exec(html)?.[1] ?? null;
}
