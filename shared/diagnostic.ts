/**
 * The one diagnostic type of the project, from the lexer to the web viewer.
 *
 * Lines and columns are 1-based and count code points (a tab is one column),
 * as NOTATION.md section 7 asks. `endLine`/`endColumn` point one past the last
 * character of the span, so an empty span has end === start.
 */
export type Severity = 'error' | 'warning' | 'info';

export interface SourceRange {
  line: number;
  column: number;
  endLine: number;
  endColumn: number;
  /** Code-unit offsets into the source string, for editors that need them. */
  offset: number;
  endOffset: number;
}

export interface Fix {
  /** What the fix does, in words ("write '+AAA' instead"). */
  title: string;
  range: SourceRange;
  replacement: string;
}

export interface Diagnostic {
  severity: Severity;
  /** Stable kebab-case id (`bead-count`, `unknown-color`, `syntax`, ...). */
  id: string;
  message: string;
  range: SourceRange;
  /** How to fix it, when the message alone does not say. */
  hint?: string;
  fix?: Fix;
}

/** What every stage returns: its value, and all it has to say about the input. */
export interface Result<T> {
  value: T;
  diagnostics: Diagnostic[];
}

export const hasErrors = (diagnostics: readonly Diagnostic[]): boolean =>
  diagnostics.some((d) => d.severity === 'error');

/** A range covering nothing at the very start of a file, for file-level problems. */
export const fileStart: SourceRange = { line: 1, column: 1, endLine: 1, endColumn: 1, offset: 0, endOffset: 0 };

/** Sort by position, then severity, so every emitter lists diagnostics in the same order. */
export function sortDiagnostics(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  const rank: Record<Severity, number> = { error: 0, warning: 1, info: 2 };
  return [...diagnostics].sort(
    (a, b) =>
      a.range.offset - b.range.offset ||
      a.range.endOffset - b.range.endOffset ||
      rank[a.severity] - rank[b.severity] ||
      a.id.localeCompare(b.id),
  );
}
