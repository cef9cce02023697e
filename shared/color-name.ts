/**
 * What printed material calls a palette colour. Designers often write a CSS
 * name (`crimson`) and no shelf name; a beader reading the steps or packing
 * a kit still needs a word, and `#dc143c` is not one.
 */
import { colorsNamed } from './culori.js';

const NAME_OF_HEX = new Map<string, string>();
// culori lists the names alphabetically, so of two names for one colour (aqua, cyan) the first is kept.
for (const [name, n] of Object.entries(colorsNamed as Record<string, number>)) {
  const hex = `#${n.toString(16).padStart(6, '0')}`;
  if (!NAME_OF_HEX.has(hex)) NAME_OF_HEX.set(hex, name);
}

/** The designer's name for the colour, else the CSS Color 4 name of its hex, else ''. */
export function colorName(color: { name: string; hex: string }): string {
  return color.name || (NAME_OF_HEX.get(color.hex.toLowerCase()) ?? '');
}
