/**
 * The one door to culori. As with Chevrotain (parser/chevrotain.ts),
 * the build replaces this module's compiled copy in dist/ with a bundle of
 * it: culori's package points Node's ES module loader at its source tree,
 * which takes longer to load than parsing and simulating a small pattern.
 */
export { colorsNamed, differenceCiede2000, parse } from 'culori';
export type { Color } from 'culori';
