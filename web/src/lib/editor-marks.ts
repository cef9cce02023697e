/**
 * Live checks in the editor: each diagnostic's span underlined and its line
 * tinted by severity. Only loaded with the editor page.
 */
import {
  Decoration,
  EditorView,
  StateEffect,
  StateField,
  type DecorationSet,
  type Extension,
  type Range,
} from '@uiw/react-codemirror';
import type { Diagnostic } from '../../../shared/diagnostic.js';

const setMarks = StateEffect.define<readonly Diagnostic[]>();

function decorations(diagnostics: readonly Diagnostic[], length: number): DecorationSet {
  const ranges: Range<Decoration>[] = [];
  for (const d of diagnostics) {
    const from = Math.min(d.range.offset, length);
    const to = Math.min(Math.max(d.range.endOffset, from), length);
    const cls = d.severity === 'error' ? 'cm-ff-error' : d.severity === 'warning' ? 'cm-ff-warning' : 'cm-ff-info';
    if (to > from) ranges.push(Decoration.mark({ class: cls, attributes: { title: d.message } }).range(from, to));
  }
  return Decoration.set(ranges, true);
}

const field = StateField.define<DecorationSet>({
  create: () => Decoration.none,
  update(marks, tr) {
    let next = marks.map(tr.changes);
    for (const e of tr.effects) if (e.is(setMarks)) next = decorations(e.value, tr.state.doc.length);
    return next;
  },
  provide: (f) => EditorView.decorations.from(f),
});

const theme = EditorView.baseTheme({
  '.cm-ff-error': { textDecoration: 'underline wavy #b91c1c' },
  '.cm-ff-warning': { textDecoration: 'underline wavy #b45309' },
  '.cm-ff-info': { textDecoration: 'underline dotted #475569' },
});

export const checkMarks: Extension = [field, theme];

export function showChecks(view: EditorView, diagnostics: readonly Diagnostic[]): void {
  view.dispatch({ effects: setMarks.of(diagnostics) });
}

/** Put the cursor at a diagnostic (or a 1-based line) and bring it into view. */
export function goTo(view: EditorView, offset: number): void {
  const pos = Math.min(offset, view.state.doc.length);
  view.dispatch({ selection: { anchor: pos }, effects: EditorView.scrollIntoView(pos, { y: 'center' }) });
  view.focus();
}

export const lineOffset = (view: EditorView, line: number): number =>
  view.state.doc.line(Math.min(Math.max(1, line), view.state.doc.lines)).from;
