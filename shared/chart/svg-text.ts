/**
 * Scene to SVG text, for the CLI, batch conversion and the server's
 * downloads. String building only: fast, and byte-identical for the same
 * scene and font.
 */
import { rootAttrs, sceneChildren, type EmbeddedFont, type SvgNode } from './elements.js';
import type { Scene } from './scene-types.js';

export type { EmbeddedFont } from './elements.js';

const escapeText = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
const escapeAttr = (s: string): string => escapeText(s).replace(/"/g, '&quot;');

function write(node: SvgNode, out: string[]): void {
  out.push('<', node.tag);
  for (const [name, value] of node.attrs) out.push(' ', name, '="', escapeAttr(value), '"');
  if (node.text === undefined && node.children === undefined) {
    out.push('/>\n');
    return;
  }
  out.push('>');
  if (node.text !== undefined) out.push(escapeText(node.text));
  if (node.children) {
    out.push('\n');
    for (const child of node.children) write(child, out);
  }
  out.push('</', node.tag, '>\n');
}

export function sceneToSvg(scene: Scene, fonts: readonly EmbeddedFont[] = []): string {
  const out: string[] = ['<?xml version="1.0" encoding="UTF-8"?>\n'];
  write({ tag: 'svg', attrs: [['xmlns', 'http://www.w3.org/2000/svg'], ...rootAttrs(scene)], children: sceneChildren(scene, fonts) }, out);
  return out.join('');
}
