/** How to write a part's name and size inside its rectangle on a sheet drawing. */
export interface FittedLabel {
  /** The name as it fits: the full label, or the part before any note in brackets. */
  name: string;
  size: number;
  /** Written up the part (a long, narrow part turned on the sheet). */
  rotate: boolean;
  /** Whether the size line fits under the name. */
  withSize: boolean;
}

/** Average advance of a character, in ems, for the drawing's sans-serif (bold is a little wider): an estimate. */
const EM_PER_CHAR = 0.6;
const SHRINK = [1, 0.8, 0.65, 0.5];

const textWidth = (text: string, size: number) => text.length * size * EM_PER_CHAR;

/**
 * Finds the largest text that fits the part: across it, else up it, trying the full name then the name without its
 * bracketed note, at shrinking sizes; null when even the shortest name will not fit (the part is then named only in
 * the drawing's description and the cut list).
 */
export function fitLabel(
  label: string,
  sizeText: string,
  width: number,
  height: number,
  font: number,
): FittedLabel | null {
  const short = label.replace(/\s*\(.*\)\s*$/, '') || label;
  const names = short === label ? [label] : [label, short];
  for (const name of names) {
    for (const factor of SHRINK) {
      const size = font * factor;
      for (const rotate of [false, true]) {
        const [along, across] = rotate ? [height, width] : [width, height];
        if (textWidth(name, size) > along * 0.9 || size * 1.3 > across) continue;
        const withSize = textWidth(sizeText, size * 0.85) <= along * 0.9 && size * 2.5 <= across;
        return { name, size, rotate, withSize };
      }
    }
  }
  return null;
}
