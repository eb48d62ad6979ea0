import { expect, type Page } from '@playwright/test';

/**
 * A small accessibility and layout check of our own for phone-sized pages (axe-core is not
 * installed): every image has alt text, every form control and button has a name, and nothing
 * runs off the right edge unless it sits in a region that scrolls on its own (a wide table).
 * It answers a list of what is wrong, empty when the page passes.
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
    /** The text a screen reader would read, leaving out what is hidden from it (icons). */
    const spokenText = (el: Element): string => {
      let out = '';
      for (const node of Array.from(el.childNodes)) {
        if (node.nodeType === Node.TEXT_NODE) out += node.textContent ?? '';
        else if (node instanceof Element && node.getAttribute('aria-hidden') !== 'true') {
          out += node.getAttribute('aria-label') ?? node.getAttribute('alt') ?? spokenText(node);
        }
      }
      return out.trim();
    };
    const named = (el: Element) => {
      if (el.getAttribute('aria-label')?.trim()) return true;
      const by = el.getAttribute('aria-labelledby');
      if (by && by.split(/\s+/).some((id) => (document.getElementById(id)?.textContent ?? '').trim() !== '')) return true;
      if ((el as HTMLInputElement).labels?.length) {
        return Array.from((el as HTMLInputElement).labels ?? []).some((l) => (l.textContent ?? '').trim() !== '');
      }
      return Boolean(el.getAttribute('title')?.trim());
    };

    // WCAG 2.2 SC 1.1.1 (non-text content): images carry a text alternative (empty when decorative).
    for (const img of Array.from(document.querySelectorAll('img'))) {
      if (!img.hasAttribute('alt')) problems.push(`image without alt: ${img.getAttribute('src') ?? ''}`);
    }
    for (const svg of Array.from(document.querySelectorAll('svg[role="img"]'))) {
      if (!named(svg)) problems.push(`drawing without a name: ${describe(svg)}`);
    }
    // WCAG 2.2 SC 4.1.2 (name, role, value): form controls and buttons have a name.
    const controls = document.querySelectorAll(
      'input:not([type="hidden"]), select, textarea, [role="combobox"], [role="checkbox"], [role="radio"], [role="switch"], [role="slider"]',
    );
    for (const control of Array.from(controls)) {
      if (control.closest('[aria-hidden="true"], [inert]')) continue;
      if (!named(control) && !spokenText(control)) problems.push(`form control without a name: ${describe(control)}`);
    }
    for (const button of Array.from(document.querySelectorAll('button, [role="button"], a[href]'))) {
      if (!isShown(button) || button.closest('[aria-hidden="true"], [inert]')) continue;
      if (!named(button) && !spokenText(button)) problems.push(`button or link without a name: ${describe(button)}`);
    }
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
    return problems;
  });
}

/** Fails with the list of problems, so a report names each one. */
export async function expectFitsPhone(page: Page, what: string): Promise<void> {
  expect(await phoneProblems(page), what).toEqual([]);
}
