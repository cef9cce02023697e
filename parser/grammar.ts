/**
 * The grammar: a Chevrotain CstParser over whole lines. The lexer has already
 * classified every line, so the only real structure is a row's unit list.
 * Tokens that cannot stand in a row (a stray ':' or ')', a number, a count
 * without a group) are accepted as part of the list and reported by
 * `to-ast.ts`, which knows enough to say what was meant; recovery stays on for
 * anything else, so one run reports every error.
 */
import { CstParser, type CstNode, type IToken } from './chevrotain.js';
import {
  allTokens,
  BodyToken,
  Colon,
  ColorKey,
  Dash,
  HeaderKey,
  LineEnd,
  LParen,
  RowNumber,
  RowStart,
  RParen,
  Times,
} from './tokens.js';

class PatternParser extends CstParser {
  constructor() {
    super(allTokens, { recoveryEnabled: true });
    this.performSelfAnalysis();
  }

  public pattern = this.RULE('pattern', () => {
    this.MANY(() => {
      this.OR([{ ALT: () => this.SUBRULE(this.textLine) }, { ALT: () => this.SUBRULE(this.rowLine) }]);
    });
  });

  /** `key: text`, `note: text`, `colors:` or a colour line `A  #2e6f8e  teal`. */
  private textLine = this.RULE('textLine', () => {
    this.OR([{ ALT: () => this.CONSUME(HeaderKey) }, { ALT: () => this.CONSUME(ColorKey) }]);
  });

  /**
   * `row 3: ...` or `rows 2-5: ...`; a missing number or colon is reported
   * from the CST. The unit list is inlined here and in `group` rather than a
   * rule of its own: a rule call per list is a measurable share of parsing a
   * large file.
   */
  private rowLine = this.RULE('rowLine', () => {
    this.CONSUME(RowStart);
    this.OPTION(() => this.CONSUME(RowNumber));
    this.OPTION2(() => {
      this.CONSUME(Dash);
      this.CONSUME2(RowNumber);
    });
    this.OPTION3(() => this.CONSUME(Colon));
    this.MANY(() => {
      this.OR([
        { ALT: () => this.CONSUME(BodyToken) },
        { ALT: () => this.SUBRULE(this.group) },
        { ALT: () => this.CONSUME(RParen) },
      ]);
    });
    this.CONSUME(LineEnd);
  });

  private group = this.RULE('group', () => {
    this.CONSUME(LParen);
    this.MANY(() => {
      this.OR([{ ALT: () => this.CONSUME(BodyToken) }, { ALT: () => this.SUBRULE(this.group) }]);
    });
    this.OPTION(() => {
      this.CONSUME(RParen);
      this.OPTION2(() => this.CONSUME(Times));
    });
  });
}

/** Built once: self-analysis is the slow part of Chevrotain. */
export const parser = new PatternParser();

export interface Parsed {
  cst: CstNode;
  errors: { token: IToken; message: string }[];
}

export function parseTokens(tokens: IToken[]): Parsed {
  parser.input = tokens;
  const cst = parser.pattern();
  const errors = parser.errors.map((e) => ({ token: e.token, message: e.message }));
  // The shared parser would otherwise hold on to the last file's tokens until the next parse.
  parser.input = [];
  return { cst, errors };
}
