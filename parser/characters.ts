/**
 * Characters that look like something a designer meant to type but are not
 * it: spaces that are not the space bar's, invisible marks, full-width forms
 * from an East Asian input method. A stray one is named by its code point,
 * since it cannot be told apart on screen, with the ASCII character to type.
 */

type Kind = 'space' | 'mark' | 'full-width' | 'dash';

interface Described {
  /** `U+00A0 (no-break space)`. */
  name: string;
  /** What to type instead: an ASCII look-alike, or '' for an invisible mark best deleted. */
  ascii: string;
  kind: Kind;
}
const SPACES: Record<number, string> = {
  0x00a0: 'no-break space',
  0x1680: 'ogham space',
  0x2000: 'en quad',
  0x2001: 'em quad',
  0x2002: 'en space',
  0x2003: 'em space',
  0x2004: 'three-per-em space',
  0x2005: 'four-per-em space',
  0x2006: 'six-per-em space',
  0x2007: 'figure space',
  0x2008: 'punctuation space',
  0x2009: 'thin space',
  0x200a: 'hair space',
  0x202f: 'narrow no-break space',
  0x205f: 'medium mathematical space',
  0x3000: 'full-width space',
};

const MARKS: Record<number, string> = {
  0x00ad: 'soft hyphen',
  0x200b: 'zero-width space',
  0x200c: 'zero-width non-joiner',
  0x200d: 'zero-width joiner',
  0x2060: 'word joiner',
  0xfeff: 'zero-width no-break space',
};

const DASHES: Record<number, string> = {
  0x2010: 'hyphen',
  0x2011: 'non-breaking hyphen',
  0x2012: 'figure dash',
  0x2013: 'en dash',
  0x2014: 'em dash',
  0x2212: 'minus sign',
};

const codePoint = (c: number): string => `U+${c.toString(16).toUpperCase().padStart(4, '0')}`;

export function describeCharacter(ch: string): Described | undefined {
  const c = ch.codePointAt(0)!;
  const named = (what: string, ascii: string, kind: Kind): Described => ({
    name: `${codePoint(c)} (${what})`,
    ascii,
    kind,
  });
  if (SPACES[c]) return named(SPACES[c], ' ', 'space');
  if (MARKS[c]) return named(MARKS[c], '', 'mark');
  if (DASHES[c]) return named(DASHES[c], '-', 'dash');
  // U+FF01-U+FF5E are the full-width forms of '!' to '~', in ASCII order.
  if (c >= 0xff01 && c <= 0xff5e) {
    const ascii = String.fromCharCode(c - 0xfee0);
    return named(`full-width '${ascii}'`, ascii, 'full-width');
  }
  return undefined;
}

/** What a stray run of characters says about itself, when it holds any look-alike. */
export interface LookAlike {
  message: string;
  /** Absent when the run also holds other stray characters: the lexer's own hint fits those better. */
  hint?: string;
  /** The run as it was meant, when every character in it has an ASCII look-alike or is invisible. */
  replacement?: string;
}

const MAX_NAMED = 3;
/** As many characters as a message quotes of a run (the lexer shortens what it shows to the same). */
export const MAX_QUOTED = 20;

const shorten = (s: string): string => {
  const cps = [...s];
  return cps.length <= MAX_QUOTED ? s : `${cps.slice(0, MAX_QUOTED).join('')}…`;
};

/** `shown` is the run as a message may quote it (shortened, controls made visible). */
export function lookAlike(run: string, shown: string): LookAlike | undefined {
  const chars = [...run];
  const described = chars.map(describeCharacter);
  const known = described.filter((d) => d !== undefined);
  if (known.length === 0) return undefined;
  const names = [...new Set(known.map((d) => d.name))];
  const listed = names.slice(0, MAX_NAMED).join(', ') + (names.length > MAX_NAMED ? ', …' : '');
  if (known.length < described.length) return { message: `'${shown}' cannot stand here; it holds ${listed}` };
  const replacement = known.map((d) => d.ascii).join('');
  const one = chars.length === 1;
  const only = (kind: Kind): boolean => known.every((d) => d.kind === kind);
  if (only('space'))
    return {
      message: `${listed} ${one ? 'looks like a space but is not one' : 'look like spaces but are not'}`,
      hint: one ? 'type an ordinary space instead' : 'type ordinary spaces instead',
      replacement,
    };
  if (only('mark'))
    return {
      message: `${one ? 'an invisible character stands' : 'invisible characters stand'} here: ${listed}`,
      hint: one ? 'delete it: it does not show, but it is there' : 'delete them: they do not show, but they are there',
      replacement,
    };
  const wide = known.some((d) => d.kind === 'full-width');
  return {
    message: `'${shown}' looks like '${shorten(replacement)}' but is ${listed}`,
    hint: `type '${replacement}' instead${wide ? ', with the keyboard set to plain (half-width) letters' : ''}`,
    replacement,
  };
}
