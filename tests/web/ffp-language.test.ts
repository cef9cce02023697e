import { describe, expect, it } from 'vitest';
import { StringStream } from '@codemirror/language';
import { ffpStream } from '../../web/src/lib/ffp-language.js';

/** Every token of a text as [text, style], the way CodeMirror's stream reader walks it. */
function tokens(text: string): [string, string | null][] {
  const state = ffpStream.startState!(2);
  const out: [string, string | null][] = [];
  for (const line of text.split('\n')) {
    const stream = new StringStream(line, 2, 2);
    while (!stream.eol()) {
      const style = ffpStream.token(stream, state);
      if (stream.current().trim()) out.push([stream.current(), style]);
      stream.start = stream.pos;
    }
  }
  return out;
}

// The example file of NOTATION.md section 2, with a continuation line and a trailing comment added.
const example = `# A fan that grows by one unit at each end of every row.
title:    Kestrel Fan
layout:   flat

colors:
  A  #F4F1EA  chalk
  B  teal  deep teal

row 1: BBBB
rows 2-3: *AAAA BA (AC CC)x2 - +AAA # edge
  AB BA
note:  Keep the tension firm.
  A`;

describe('.ffp highlighting', () => {
  const t = tokens(example);
  const style = (text: string, nth = 0) => t.filter(([s]) => s === text)[nth]?.[1];

  it('tells comments, header keys and their values apart', () => {
    expect(t[0]).toEqual(['# A fan that grows by one unit at each end of every row.', 'comment']);
    expect(style('title')).toBe('propertyName');
    expect(style('Kestrel Fan')).toBe('string');
    expect(style('colors')).toBe('propertyName');
    expect(style('note')).toBe('propertyName');
  });

  it('colours a colour line as key, colour (hex or CSS name) and name', () => {
    expect(style('A')).toBe('variableName.definition');
    expect(style('#F4F1EA')).toBe('color');
    expect(style('chalk')).toBe('string');
    expect(style('teal')).toBe('color');
    expect(style('deep teal')).toBe('string');
  });

  it('colours row words, numbers, marks, skips, groups and keys in a row and its continuation', () => {
    expect(style('row')).toBe('keyword');
    expect(style('rows')).toBe('keyword');
    expect(style('1')).toBe('number');
    expect(style('2')).toBe('number');
    expect(style('*')).toBe('operator');
    expect(style('+')).toBe('operator');
    // The range dash and the skip dash.
    expect(style('-', 0)).toBe('operator');
    expect(style('-', 1)).toBe('operator');
    expect(style('(')).toBe('paren');
    expect(style(')')).toBe('paren');
    expect(style('x2')).toBe('number');
    expect(style('AAAA')).toBe('variableName');
    expect(style('# edge')).toBe('comment');
    // The indented line after a row continues it: units, not a colour line.
    expect(style('AB')).toBe('variableName');
  });

  it('does not take an indented line after a note for a continuation or a colour', () => {
    const last = t.at(-1)!;
    expect(last).toEqual(['A', null]);
  });
});
