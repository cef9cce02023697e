/**
 * After a move to another page, focus goes to the new page's main heading
 * (or the main landmark when it has none), so keyboard and screen-reader
 * readers start at the new content and hear its name. The first page of a
 * visit is left alone: the browser already starts at the top. A change of
 * query only (the library's search, sort and page) is not a new page.
 */
import { useEffect, useRef, type RefObject } from 'react';
import { useLocation, useNavigation } from 'react-router-dom';

export function focusMain(main: HTMLElement): void {
  const target = main.querySelector<HTMLElement>('h1') ?? main;
  // Headings are not focusable by themselves; -1 lets a script focus them without adding a Tab stop.
  if (!target.hasAttribute('tabindex')) target.setAttribute('tabindex', '-1');
  target.focus({ preventScroll: target === main });
}

export function useRouteFocus(main: RefObject<HTMLElement | null>): void {
  const { pathname } = useLocation();
  const navigation = useNavigation();
  const shown = useRef(pathname);
  useEffect(() => {
    // Wait for the new page's loaders, so the heading that gets focus is the one that stays.
    if (navigation.state !== 'idle' || shown.current === pathname) return;
    shown.current = pathname;
    if (main.current) focusMain(main.current);
  }, [pathname, navigation.state, main]);
}
