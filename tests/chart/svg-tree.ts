/**
 * SVG text to a flat list of elements with their attributes, through
 * fast-xml-parser (the reference XML parser of these tests), so emitters are
 * compared on what a parser reads, not on strings.
 */
import { XMLParser, XMLValidator } from 'fast-xml-parser';

export interface ParsedElement {
  tag: string;
  attrs: Record<string, string>;
  text: string;
  depth: number;
}

type OrderedNode = Record<string, unknown> & { ':@'?: Record<string, string> };

const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: '',
  preserveOrder: true,
  parseAttributeValue: false,
  parseTagValue: false,
  trimValues: false,
  ignoreDeclaration: true,
});

export const isWellFormed = (svg: string): true | string => {
  const result = XMLValidator.validate(svg);
  return result === true ? true : `${result.err.code} at ${result.err.line}:${result.err.col}: ${result.err.msg}`;
};

export function flatten(svg: string): ParsedElement[] {
  const out: ParsedElement[] = [];
  const walk = (nodes: OrderedNode[], depth: number): void => {
    for (const node of nodes) {
      const tag = Object.keys(node).find((k) => k !== ':@');
      if (tag === undefined || tag === '#text') continue;
      const children = (node[tag] as OrderedNode[]) ?? [];
      const text = children
        .map((c) => (typeof c['#text'] === 'string' || typeof c['#text'] === 'number' ? String(c['#text']) : ''))
        .join('');
      out.push({
        tag,
        attrs: { ...(node[':@'] ?? {}) },
        text: children.some((c) => !('#text' in c)) ? '' : text,
        depth,
      });
      walk(children, depth + 1);
    }
  };
  walk(parser.parse(svg) as OrderedNode[], 0);
  return out;
}
