/**
 * SVG to PNG with resvg (its native binary ships inside the npm package). The
 * bundled font is loaded from files and system fonts are not, so a PNG looks
 * the same on every machine.
 */
import { FONT_FAMILY, fontFiles } from './font.js';

export const DEFAULT_DPI = 192;

// Loaded on the first PNG: a native module that every other command and every SVG-only batch would load for nothing.
let rasteriser: Promise<typeof import('@resvg/resvg-js')> | undefined;

/** The chart's width and height are in mm, so `dpi` alone sets the pixel size. */
export async function svgToPng(svg: string | Buffer, dpi = DEFAULT_DPI): Promise<Buffer> {
  const { Resvg } = await (rasteriser ??= import('@resvg/resvg-js'));
  const resvg = new Resvg(svg, {
    dpi,
    font: {
      loadSystemFonts: false,
      fontFiles: await fontFiles(),
      defaultFontFamily: FONT_FAMILY,
      monospaceFamily: FONT_FAMILY,
      sansSerifFamily: FONT_FAMILY,
      serifFamily: FONT_FAMILY,
    },
    shapeRendering: 2,
    textRendering: 1,
    logLevel: 'off',
  });
  return resvg.render().asPng();
}
