/**
 * The parser's one door to Chevrotain. The build replaces this module's
 * compiled copy in dist/ with a single-file bundle of it (see the
 * `build:cli` script): Chevrotain's package points Node at its ES module
 * tree, hundreds of files with lodash-es, which Node takes about 0.4 s to
 * load, and every batch-conversion worker thread would pay that again.
 * From one file it loads in a few hundredths of a second.
 */
export { createToken, createTokenInstance, CstParser, Lexer } from 'chevrotain';
export type { CstElement, CstNode, IToken, TokenType } from 'chevrotain';
