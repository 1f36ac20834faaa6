import { z } from 'zod';
import { DEFAULT_SPAN_LIMIT_RATIO } from '../engineering/beams-data';
import { SHEET_MATERIALS, type SheetMaterialId } from '../engineering/sheet-data';
import { DEFAULT_TIMBER_CLASS, STANDARD_SECTIONS } from '../engineering/timber-data';
import { DEFAULT_KERF_MM, STANDARD_SHEET_MM, UK_STOCK_LENGTHS_MM } from '../packing/trade-defaults';
import {
  DEFAULT_BRACKET_SPACING_MM,
  DEFAULT_LEG_HEIGHT_MM,
  DEFAULT_POINT_LOAD_N,
  DEFAULT_TOP_SHEET,
  DEFAULT_UNIFORM_LOAD_KG_M2,
} from '../defaults';
import { PLAN_LIMITS } from '../limits';
import { choiceField, rangeField, strictGroup, wholeMmField, wholeNumberField } from './fields';

const SECTION_IDS = STANDARD_SECTIONS.map((s) => s.id) as [string, ...string[]];
const SHEET_IDS = Object.keys(SHEET_MATERIALS) as [SheetMaterialId, ...SheetMaterialId[]];

const sectionId = (label: string, fallback: string) =>
  choiceField(label, SECTION_IDS)
    .default(fallback)
    .describe(`Id of a standard section (engineering standardSections); default "${fallback}".`);
const measuredWidth = () =>
  rangeField('Section width', 'mm', 10, 300)
    .optional()
    .describe('Measured wider face, mm (44 for UK 2x1), standing upright on a rail; default the standard size.');
const measuredThickness = () =>
  rangeField('Section thickness', 'mm', 10, 100)
    .optional()
    .describe('Measured narrower face, mm (18 for UK 2x1); default the standard size.');

/** A timber section by its standard id, with the sizes the user measured on their merchant's stock. */
export const sectionChoiceSchema = strictGroup('the frame section', {
  sectionId: sectionId('frame section', 'uk-2x1'),
  widthMm: measuredWidth(),
  thicknessMm: measuredThickness(),
});

/** Legs under every board (four at the corners, more along the sides when maxSpanMm asks for them). */
export const legsSchema = strictGroup('the legs', {
  kind: z.literal('legs').describe('Boards stand on legs.'),
  sectionId: sectionId('leg section', 'uk-2x2'),
  widthMm: measuredWidth(),
  thicknessMm: measuredThickness(),
  heightMm: wholeMmField('Board height', 300, 1500)
    .default(DEFAULT_LEG_HEIGHT_MM)
    .describe('Height of the lower level’s top above the floor, mm.'),
  maxSpanMm: wholeMmField('Longest span between legs', 300, 3000)
    .optional()
    .describe('Longest side rail between leg centres, mm; pairs of legs are added along the sides to keep to it.'),
});

/** A batten screwed to the wall under each board's back edge, with brackets under the front. */
export const wallBattensSchema = strictGroup('the wall battens', {
  kind: z.literal('wall-battens').describe('Boards rest on a wall batten and brackets.'),
  bracketSpacingMm: wholeMmField('Bracket spacing', 200, 1500)
    .default(DEFAULT_BRACKET_SPACING_MM)
    .describe('Longest distance between bracket centres under a board, mm; a bracket goes under each end.'),
});

/** How a board is built: frame timber, top sheet, supports and the stock it is cut from. */
export const constructionSchema = strictGroup('the construction', {
  frameSection: sectionChoiceSchema
    .prefault({})
    .describe('Section of the rails, cross members, braces and battens, on edge; default UK 2x1 (44 × 18 mm).'),
  timberClass: choiceField('timber strength class', ['C16', 'C24'])
    .default(DEFAULT_TIMBER_CLASS)
    .describe('EN 338 strength class of the timber: stiffness for sag and density for weight; default C16.'),
  crossMemberSpacingMm: rangeField('Cross-member spacing', 'mm', 150, 1000)
    .optional()
    .describe('Largest centres of the cross members, mm; default 400 (metric) or 16 in = 406.4 mm (imperial).'),
  topSheet: strictGroup('the top sheet', {
    material: choiceField('top sheet material', SHEET_IDS)
      .default(DEFAULT_TOP_SHEET.material)
      .describe('Sheet material of the tops (and of any lower shelves and kickboards); default birch plywood.'),
    thicknessMm: rangeField('Top sheet thickness', 'mm', 3, 50)
      .default(DEFAULT_TOP_SHEET.thicknessMm)
      .describe('Thickness of the top sheet, mm (9, 12, 18 for plywood).'),
  })
    .prefault({})
    .describe('The sheet every board’s top is cut from; default 9 mm birch plywood.'),
  supports: z
    .discriminatedUnion('kind', [legsSchema, wallBattensSchema], {
      error: 'Choose what the boards stand on: kind "legs" or "wall-battens".',
    })
    .prefault({ kind: 'legs' })
    .describe('What carries the boards: legs, or a wall batten with brackets.'),
  kerfMm: wholeNumberField('Saw kerf', 0, 10, 'mm')
    .default(DEFAULT_KERF_MM)
    .describe('Width of material one saw cut removes, whole mm; default 3.'),
  stockLengthsMm: z
    .array(wholeNumberField('Stock length', 300, 7200, 'mm'), { error: 'List the timber lengths on sale in mm.' })
    .min(1, { error: 'List at least one timber length on sale.' })
    .max(PLAN_LIMITS.maxStockLengths, { error: `List at most ${PLAN_LIMITS.maxStockLengths} timber lengths.` })
    .default([...UK_STOCK_LENGTHS_MM])
    .describe('Lengths the timber is sold in, whole mm; default the UK merchants’ 1.8 m to 5.4 m.'),
  sheetSizeMm: strictGroup('the sheet size', {
    lengthMm: wholeNumberField('Sheet length', 600, 3660, 'mm')
      .default(STANDARD_SHEET_MM.width)
      .describe('The sheet’s long side, mm, along its face grain.'),
    widthMm: wholeNumberField('Sheet width', 300, 1830, 'mm')
      .default(STANDARD_SHEET_MM.height)
      .describe('The sheet’s short side, mm.'),
  })
    .prefault({})
    .describe('Size of the sheets on sale, whole mm; default 2440 × 1220 (8 × 4 ft).'),
  yardCutsSheets: z
    .boolean({ error: 'Say whether the yard cuts the sheets (true or false).' })
    .default(false)
    .describe('Have the supplier cut the sheets: adds the yard cut list and the supplier’s charge per cut.'),
});

/** The loads boards are checked for. */
export const loadsSchema = strictGroup('the loads', {
  uniformKgM2: rangeField('Load on the top', 'kg/m²', 0, 500)
    .default(DEFAULT_UNIFORM_LOAD_KG_M2)
    .describe('Track, ballast and scenery on the top, kg/m²; default 50 (common practice, no source).'),
  pointLoadN: rangeField('Leaning load', 'N', 0, 3000)
    .default(DEFAULT_POINT_LOAD_N)
    .describe(
      'Someone leaning on the front edge at mid-span, N; default 0 (not checked); about 500 N is usual for a person leaning (common practice, no source).',
    ),
  spanLimitRatio: wholeNumberField('Sag limit ratio', 150, 500)
    .default(DEFAULT_SPAN_LIMIT_RATIO)
    .describe('Allowed sag is span / this; default 300, from EN 1995-1-1 Table 7.2’s range (L/150 to L/500).'),
});
