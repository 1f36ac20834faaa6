import { computePlan, singlePortableModule, tenByThirteenTwoLevel, type Plan } from '@shared/planner';
import { mount } from '@vue/test-utils';
import { describe, expect, it } from 'vitest';
import PlanBoardDrawing from '@/components/planner/PlanBoardDrawing.vue';

function drawBoard(plan: Plan, index: number) {
  const board = plan.boards[index]!;
  const wiring = plan.wiring.boards.find((w) => w.boardId === board.id);
  const wrapper = mount(PlanBoardDrawing, { props: { board, wiring, title: `Plan view of ${board.name}` } });
  return { board, wiring, wrapper };
}

describe('the plan view of a board', () => {
  it('draws every member the frame has: rails, cross members at their positions, and legs', () => {
    const { board, wrapper } = drawBoard(computePlan(singlePortableModule), 0);
    const { drawing } = board.frame;

    expect(wrapper.findAll('.plan-board-drawing__rail')).toHaveLength(
      drawing.sideRails.length + drawing.endRails.length,
    );
    const crossMembers = wrapper.findAll('.plan-board-drawing__cross-member');
    expect(crossMembers).toHaveLength(board.frame.crossMemberCentresMm.length);
    crossMembers.forEach((rect, i) => {
      expect(Number(rect.attributes('x'))).toBe(drawing.crossMembers[i]!.x);
      expect(Number(rect.attributes('width'))).toBe(drawing.crossMembers[i]!.width);
    });
    expect(wrapper.findAll('.plan-board-drawing__leg')).toHaveLength(drawing.legs.length);
  });

  it('draws each bus pair and the drilling template: one hole per pair in every cross member', () => {
    const { board, wiring, wrapper } = drawBoard(computePlan(singlePortableModule), 0);

    const wires = wrapper.findAll('.plan-board-drawing__wire, .plan-board-drawing__wire--accessory');
    expect(wires).toHaveLength(wiring!.runs.length);
    expect(wrapper.findAll('.plan-board-drawing__hole')).toHaveLength(
      board.frame.crossMemberCentresMm.length * wiring!.holes.acrossMm.length,
    );
    expect(wrapper.findAll('.plan-board-drawing__dropper')).toHaveLength(wiring!.droppers.pairs);
  });

  it('has an accessible name and a description in words', () => {
    const { board, wrapper } = drawBoard(computePlan(singlePortableModule), 0);
    const svg = wrapper.find('svg');
    const [titleId, descId] = svg.attributes('aria-labelledby')!.split(' ');

    expect(svg.attributes('role')).toBe('img');
    expect(wrapper.find(`#${titleId}`).text()).toBe(`Plan view of ${board.name}`);
    expect(wrapper.find(`#${descId}`).text()).toContain(`${board.frame.crossMemberCentresMm.length} cross members`);
  });

  it('labels the overall length and width, and each cross-member bay', () => {
    const { board, wrapper } = drawBoard(computePlan(singlePortableModule), 0);
    const labels = wrapper.findAll('text').map((t) => t.text());

    expect(labels).toContain(`${board.lengthMm} mm`);
    expect(labels).toContain(`${board.widthMm} mm`);
    expect(wrapper.findAll('.plan-board-drawing__chain')).toHaveLength(board.frame.crossMemberCentresMm.length + 1);
  });

  it('draws a lift-out with no legs', () => {
    const plan = computePlan(tenByThirteenTwoLevel);
    const liftOut = plan.boards.findIndex((b) => b.source === 'lift-out');

    expect(drawBoard(plan, liftOut).wrapper.findAll('.plan-board-drawing__leg')).toHaveLength(0);
  });

  it('draws no legs under an upper board that stands on the legs of the board below, but draws those legs there', () => {
    const plan = computePlan(tenByThirteenTwoLevel);
    const upper = plan.boards.findIndex((b) => b.level === 'upper' && b.frame.support === 'carried');
    const carried = drawBoard(plan, upper);
    const lower = drawBoard(
      plan,
      plan.boards.findIndex((b) => b.id === carried.board.carriedBy),
    );

    // The upper frame knows where the legs stand (its rail span is measured between them) …
    expect(carried.board.frame.legPairCentresMm.length).toBeGreaterThan(0);
    // … but they are the lower board's legs, drawn on the lower board only.
    expect(carried.wrapper.findAll('.plan-board-drawing__leg')).toHaveLength(0);
    expect(carried.wrapper.find('desc').text()).toContain('carried on the legs of the board below');
    expect(carried.wrapper.find('desc').text()).not.toContain('legs inside the frame');
    expect(lower.wrapper.findAll('.plan-board-drawing__leg')).toHaveLength(lower.board.frame.drawing.legs.length);
    expect(lower.board.frame.drawing.legs.length).toBeGreaterThan(0);
    expect(carried.wrapper.findAll('.plan-board-drawing__cross-member')).toHaveLength(
      carried.board.frame.crossMemberCentresMm.length,
    );
  });
});
