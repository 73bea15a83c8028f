/**
 * Watches a page for Content Security Policy violations: Chromium logs each blocked inline style
 * or script as a console error ("... violates the following Content Security Policy directive
 * ..."), on every document of the page, reloads included. Call right after launch.
 */
import type { Page } from 'playwright-core';

export const watchPolicyViolations = (page: Page) => {
  const seen: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error' && message.text().includes('Content Security Policy')) seen.push(message.text().slice(0, 300));
  });
  return { violations: (): string[] => seen.slice() };
};

/** How a drawn plot is styled: Plot's own CSS (display block, max-width 100%) must reach it. */
export const plotStyle = (page: Page, selector: string) =>
  page.locator(selector).first().evaluate((svg) => {
    const style = getComputedStyle(svg);
    return { display: style.display, maxWidth: style.maxWidth, fontFamily: style.fontFamily, styleElements: document.querySelectorAll('style').length };
  });
