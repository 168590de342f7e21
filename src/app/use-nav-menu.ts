import { useEffect, useRef, useState } from 'react';

/**
 * The folded navigation's menu: open puts focus on its first link, Escape (from anywhere on the
 * page) closes it and gives focus back to the menu button, so it works from the keyboard alone.
 */
export function useNavMenu() {
  const [open, setOpen] = useState(false);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const navRef = useRef<HTMLElement>(null);

  useEffect(() => {
    if (!open) return;
    navRef.current?.querySelector<HTMLElement>('a[href]')?.focus();
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      setOpen(false);
      buttonRef.current?.focus();
    };
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [open]);

  return { open, toggle: () => setOpen((was) => !was), close: () => setOpen(false), buttonRef, navRef };
}
