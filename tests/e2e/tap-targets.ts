import type { Locator, Page } from '@playwright/test';

/** Gloved fingers on a booth tablet: every control at least this many CSS pixels both ways (WCAG 2.5.5). */
export const minTarget = 44;

/**
 * The controls shown inside `scope` that are smaller than `minTarget` in either direction and whose
 * label (the one wrapping it, or the one naming it with `for`) is not big enough either. Each is
 * described by its role, name and size so a failure says what to make bigger.
 */
export async function smallTargets(scope: Page | Locator): Promise<string[]> {
  const root = 'locator' in scope && 'goto' in scope ? scope.locator('body') : scope;
  return root.evaluate((container, min) => {
    const controls = 'a[href], button, input:not([type="hidden"]), select, textarea, summary, [role="button"], [role="switch"], [role="checkbox"], [role="radio"], [role="tab"]';
    const fits = (element: Element) => {
      const box = element.getBoundingClientRect();
      return box.width >= min - 0.5 && box.height >= min - 0.5;
    };
    const shown = (element: Element) => element.getClientRects().length > 0 && getComputedStyle(element).visibility !== 'hidden';
    const labelOf = (element: Element) => element.closest('label') ?? (element.id ? document.querySelector(`label[for="${CSS.escape(element.id)}"]`) : null);
    const describe = (element: Element) => {
      const box = element.getBoundingClientRect();
      const name = element.getAttribute('aria-label') ?? labelOf(element)?.textContent ?? element.textContent ?? '';
      const kind = element.getAttribute('type') ?? element.getAttribute('role') ?? '';
      return `${element.tagName.toLowerCase()}${kind ? `[${kind}]` : ''} "${name.trim().replace(/\s+/g, ' ').slice(0, 60)}" is ${Math.round(box.width)}×${Math.round(box.height)}`;
    };
    // A control clipped away or 1 px across is visually hidden until focused (the skip link): not a tap target.
    const visuallyHidden = (element: Element) => {
      const box = element.getBoundingClientRect();
      const style = getComputedStyle(element);
      return (box.width <= 1 && box.height <= 1) || style.clipPath === 'inset(50%)' || style.clip === 'rect(0px, 0px, 0px, 0px)';
    };
    const tooSmall = (element: Element) => {
      if (!shown(element) || fits(element)) return false;
      const label = labelOf(element);
      if (label && shown(label)) return !fits(label);
      return !visuallyHidden(element);
    };
    return [...container.querySelectorAll(controls)].filter(tooSmall).map(describe);
  }, minTarget);
}
