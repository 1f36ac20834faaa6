import type { RGB } from 'pdf-lib';

/** The colours a plan is printed in, from the theme's `--bw-print-*` variables. */
export interface PdfColours {
  ink: RGB;
  muted: RGB;
  timber: RGB;
  ply: RGB;
  wire: RGB;
}

type RgbFn = (r: number, g: number, b: number) => RGB;

/** A `#rrggbb` theme value as 0–1 channels; black when the variable is missing (a print never needs more). */
function channels(name: string): [number, number, number] {
  const value = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  const match = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(value);
  if (!match) return [0, 0, 0];
  return [1, 2, 3].map((i) => parseInt(match[i]!, 16) / 255) as [number, number, number];
}

/**
 * Reads the print colours from theme.css, the one place colours are kept. They are the same in light and dark
 * themes: paper is white whatever the screen shows.
 */
export function printColours(rgb: RgbFn): PdfColours {
  const read = (name: string) => rgb(...channels(`--bw-print-${name}`));
  return {
    ink: read('ink'),
    muted: read('muted'),
    timber: read('timber'),
    ply: read('ply'),
    wire: read('wire'),
  };
}
