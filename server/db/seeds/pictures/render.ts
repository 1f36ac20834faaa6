import sharp from 'sharp';
import type { Finish } from '../../../../shared/listings/vocabulary';
import { listingInputSchema, moduleListingSchema } from '../../../../shared/schemas/listings';
import type { DemoListing } from '../data/kit';
import { boardDrawing, type BoardDrawing } from './board';
import { endView } from './end-view';
import { planView } from './plan-view';
import { sceneView } from './scene-view';

type View = (b: BoardDrawing) => string;

/** What is worth showing first: the scene once there is one, else the frame. */
const VIEWS_BY_FINISH: Record<Finish, View[]> = {
  'bare-frame': [planView, endView],
  topped: [planView, endView],
  'track-laid': [planView, sceneView, endView],
  'wired-running': [planView, sceneView, endView],
  'part-sceniced': [sceneView, planView, endView],
  'fully-sceniced': [sceneView, planView, endView],
};

/** The drawings of one demo listing as SVG: a module's own board, or a builder's portfolio boards. */
export function demoDrawings(demo: DemoListing): string[] {
  const body = listingInputSchema.parse(demo.body);
  let drawings: string[];
  if (body.kind === 'module') {
    const board = boardDrawing(demo.slug, body.title, body);
    drawings = VIEWS_BY_FINISH[body.finish].map((view) => view(board));
  } else {
    const boards = (demo.portfolio ?? []).map((m, i) => {
      const board = moduleListingSchema.parse(m);
      return boardDrawing(`${demo.slug}-${i}`, `${board.title}, built to order`, board);
    });
    drawings = [...boards.map(planView), ...boards.slice(0, 1).map(endView)];
  }
  return drawings.slice(0, Math.max(1, Math.min(3, demo.pictures ?? 3)));
}

/** Render an SVG drawing to a JPEG, as a camera or a phone would hand one to the upload form. */
export const toJpeg = (svg: string): Promise<Buffer> =>
  sharp(Buffer.from(svg), { density: 60 }).flatten({ background: '#ffffff' }).jpeg({ quality: 88 }).toBuffer();
