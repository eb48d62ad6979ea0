import { AxeBuilder } from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';

/** The WCAG 2.1 level A and AA rules of axe-core. */
export const WCAG_21_AA = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];

/**
 * axe-core's WCAG 2.1 A and AA check of the page as it stands, one line per violation: the rule,
 * its impact, what it asks and the selectors of the elements that break it. Empty when it passes.
 */
export async function axeProblems(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).withTags(WCAG_21_AA).analyze();
  return violations.map((v) => {
    const targets = v.nodes.map((node) => node.target.map((part) => (Array.isArray(part) ? part.join(' >>> ') : part)).join(' '));
    return `${v.id} (${v.impact ?? 'unknown'}): ${v.help} — ${targets.join(' | ')}`;
  });
}

/**
 * The layout checks axe does not make, for phone-sized pages: nothing runs off the right edge
 * unless it sits in a region that scrolls on its own (a wide table), no floating label sits on the
 * field above it, and no list item shows a marker beside its own number. It answers a list of what
 * is wrong, empty when the page passes.
 */
export async function phoneProblems(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const problems: string[] = [];
    const vw = document.documentElement.clientWidth;
    const describe = (el: Element) => {
      const id = el.id ? `#${el.id}` : '';
      const cls = typeof el.className === 'string' && el.className ? `.${el.className.trim().split(/\s+/).slice(0, 2).join('.')}` : '';
      const text = (el.textContent ?? '').trim().replace(/\s+/g, ' ').slice(0, 40);
      return `<${el.tagName.toLowerCase()}${id}${cls}> "${text}"`;
    };
    const isShown = (el: Element) => {
      const box = el.getBoundingClientRect();
      const style = getComputedStyle(el);
      return box.width > 0 && box.height > 0 && style.visibility !== 'hidden' && style.display !== 'none';
    };
    // WCAG 2.2 SC 1.4.10 (reflow): at 320 CSS px nothing needs scrolling sideways; we check the phone's width.
    if (document.documentElement.scrollWidth > vw)
      problems.push(`the page scrolls sideways: ${document.documentElement.scrollWidth} > ${vw}`);
    const scrollsOnItsOwn = (el: Element) => {
      for (let up = el.parentElement; up && up !== document.body; up = up.parentElement) {
        if (up.classList.contains('mat-drawer-content') || up.classList.contains('mat-drawer-inner-container')) return false;
        if (['auto', 'scroll', 'hidden', 'clip'].includes(getComputedStyle(up).overflowX)) return true;
      }
      return false;
    };
    for (const el of Array.from(document.querySelectorAll('main *, .lb-toolbar *'))) {
      const box = el.getBoundingClientRect();
      if (box.width === 0 || box.right <= vw + 1 || !isShown(el) || scrollsOnItsOwn(el)) continue;
      // Report the outermost offender only.
      const up = el.parentElement;
      if (up?.matches('main *, .lb-toolbar *') && up.getBoundingClientRect().right > vw + 1 && !scrollsOnItsOwn(up)) continue;
      problems.push(`runs off the right edge (${Math.round(box.right)} > ${vw}): ${describe(el)}`);
    }
    // Fields stacked on a phone keep apart: a floating label (drawn above its outline) must not touch
    // the outline of the field before it.
    const outlines = Array.from(document.querySelectorAll('main .mat-mdc-text-field-wrapper')).filter(isShown);
    for (const label of Array.from(document.querySelectorAll('main .mdc-floating-label--float-above')).filter(isShown)) {
      const own = label.closest('.mat-mdc-text-field-wrapper');
      const l = label.getBoundingClientRect();
      for (const other of outlines) {
        if (other === own) continue;
        const o = other.getBoundingClientRect();
        if (l.left < o.right && l.right > o.left && l.top < o.bottom + 2 && l.bottom > o.top) {
          problems.push(`a field's label touches the field above: ${describe(label)} on ${describe(other)}`);
        }
      }
    }
    // An item that carries its number in its words ("1. Base coat", "Layer 1: Primer") draws no marker too.
    for (const li of Array.from(document.querySelectorAll('main li')).filter(isShown)) {
      const style = getComputedStyle(li);
      const text = (li.textContent ?? '').trim();
      if (style.display === 'list-item' && style.listStyleType !== 'none' && /^(\d+\.|(layer|step|coat) \d+)/i.test(text)) {
        problems.push(`a list item shows a marker and its own number: ${describe(li)}`);
      }
    }
    return problems;
  });
}

/** Both checks together: axe's WCAG 2.1 A/AA rules, then nothing off the right edge. */
export async function pageProblems(page: Page): Promise<string[]> {
  return [...(await axeProblems(page)), ...(await phoneProblems(page))];
}

/** Fails with the list of problems, so a report names each one. */
export async function expectFitsPhone(page: Page, what: string): Promise<void> {
  expect(await pageProblems(page), what).toEqual([]);
}
