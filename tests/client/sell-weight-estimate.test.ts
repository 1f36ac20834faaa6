import { flushPromises, mount } from '@vue/test-utils';
import { moduleListingSchema } from '@shared/schemas/listing-module';
import { createPinia } from 'pinia';
import { beforeEach, describe, expect, it } from 'vitest';
import { defineComponent, h } from 'vue';
import SellTextField from '@/components/sell/SellTextField.vue';
import SellWeightEstimate from '@/components/sell/SellWeightEstimate.vue';
import { provideSellForm } from '@/components/sell/sell-form';
import { LENGTH_UNIT_KEY, reloadLengthUnit } from '@/composables/useLengthUnit';
import { useDraftForm } from '@/composables/useDraftForm';
import { blankModuleDraft, type ModuleDraft } from '@/utils/listings/module-draft';
import { readModuleDraft } from '@/utils/listings/module-read';

/** Step 2 filled in for a 1200 × 600 mm board of 44 × 18 frame at 400 mm, 9 mm birch ply top, no legs. */
function builtDraft(): ModuleDraft {
  return {
    ...blankModuleDraft(),
    lengthMm: '1200',
    widthMm: '600',
    heightMm: '100',
    'construction.frameDepthMm': '44',
    'construction.frameThicknessMm': '18',
    'construction.crossMemberSpacingMm': '400',
    'construction.topMaterial': 'birch-plywood',
    'construction.topThicknessMm': '9',
    'construction.supports': 'none',
  };
}

/** The weight box and the estimate under it, in a form like the sell page's. */
function mountEstimate(start: ModuleDraft) {
  let draft!: ModuleDraft;
  const Harness = defineComponent({
    setup() {
      const form = useDraftForm({
        id: 'sell',
        draft: start,
        read: (d) => readModuleDraft(d, localStorage.getItem(LENGTH_UNIT_KEY) === 'ft-in' ? 'ft-in' : 'mm'),
        schema: moduleListingSchema,
      });
      draft = form.draft;
      provideSellForm(form);
      return () => h('div', [h(SellTextField, { name: 'weightKg', label: 'Weight' }), h(SellWeightEstimate)]);
    },
  });
  const wrapper = mount(Harness, { global: { plugins: [createPinia()] }, attachTo: document.body });
  const button = (name: string) => wrapper.findAll('button').find((b) => b.text() === name);
  const weightBox = () => wrapper.find<HTMLInputElement>('input').element;
  return { wrapper, draft: () => draft, button, weightBox };
}

describe('estimating the weight from the construction on the sell form', () => {
  beforeEach(() => {
    localStorage.clear();
    reloadLengthUnit();
    document.body.innerHTML = '';
  });

  it('says which boxes of step 2 to fill in first', async () => {
    const { wrapper, button } = mountEstimate(blankModuleDraft());

    await button('Estimate from construction')!.trigger('click');

    expect(wrapper.text()).toContain('first fill in the length, width, frame timber depth');
    expect(wrapper.text()).toContain('top and what holds it up in step 2');
  });

  it('puts the planner’s estimate into the weight box when the seller takes it', async () => {
    const { wrapper, draft, button, weightBox } = mountEstimate(builtDraft());

    await button('Estimate from construction')!.trigger('click');
    // Worked by hand in tests/shared/planner/estimate-module-weight.test.ts: 1.364 kg of C16 frame + 4.504 kg of top.
    expect(wrapper.text()).toContain('Estimated 5.9 kg for one board: frame 1.4 kg, top 4.5 kg.');
    expect(wrapper.text()).toContain('the top at 695 kg/m³ (birch plywood)');
    await button('Use 5.9 kg as the weight')!.trigger('click');

    expect(weightBox().value).toBe('5.9');
    expect(draft().weightSource).toBe('estimated');
    expect(readModuleDraft(draft(), 'mm').input).toMatchObject({ weightKg: 5.9, weightSource: 'estimated' });
  });

  it('keeps a taken estimate in step with the construction, until the seller types a weight', async () => {
    const { draft, button, weightBox } = mountEstimate(builtDraft());
    await button('Estimate from construction')!.trigger('click');
    await button('Use 5.9 kg as the weight')!.trigger('click');

    // A 12 mm top: 1.2 × 0.6 × 0.012 m × 695 kg/m³ = 6.005 kg, with the 1.364 kg frame 7.369 kg → 7.4 kg.
    draft()['construction.topThicknessMm'] = '12';
    await flushPromises();
    expect(weightBox().value).toBe('7.4');
    expect(draft().weightSource).toBe('estimated');

    draft().weightKg = '8.2';
    await flushPromises();
    expect(draft().weightSource).toBe('entered');
    draft()['construction.topThicknessMm'] = '9';
    await flushPromises();
    expect(weightBox().value).toBe('8.2');
  });

  it('gives the legs it counted in feet and inches when the seller works in them', async () => {
    localStorage.setItem(LENGTH_UNIT_KEY, 'ft-in');
    reloadLengthUnit();
    const { wrapper, button } = mountEstimate({
      ...builtDraft(),
      lengthMm: '1200 mm',
      widthMm: '600 mm',
      'construction.frameDepthMm': '44 mm',
      'construction.frameThicknessMm': '18 mm',
      'construction.crossMemberSpacingMm': '400 mm',
      'construction.topThicknessMm': '9 mm',
      'construction.supports': 'legs',
    });

    await button('Estimate from construction')!.trigger('click');

    // Legs 900 − 9 = 891 mm = 35.08 in → 2' 11 1/16" (nearest 1/16 in; 1 in = 25.4 mm exactly); 900 mm → 2' 11 7/16".
    expect(wrapper.text()).toContain(`4 legs of 2x2 (1 3/4" × 1 3/4"), 2' 11 1/16" long, for a top 2' 11 7/16" above`);
    expect(wrapper.text()).toContain('Estimated 9.5 kg');
  });

  it('says why there is no estimate for a top the planner has no density for', async () => {
    const { wrapper, button } = mountEstimate({ ...builtDraft(), 'construction.topMaterial': 'softboard' });

    await button('Estimate from construction')!.trigger('click');

    expect(wrapper.text()).toContain('The planner has no density for fibre softboard, so weigh the board instead.');
  });
});
