import { mount } from '@vue/test-utils';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { nextTick } from 'vue';
import PlannerLengthInput from '@/components/planner/PlannerLengthInput.vue';
import { LENGTH_UNIT_KEY, reloadLengthUnit, useLengthUnit } from '@/composables/useLengthUnit';

function mountLength(mm: number) {
  return mount(PlannerLengthInput, { props: { modelValue: mm }, attachTo: document.body });
}

/** The millimetres the input last reported. */
const lastMm = (wrapper: ReturnType<typeof mountLength>) => wrapper.emitted('update:modelValue')?.at(-1)?.[0];

describe('the length input and the unit toggle', () => {
  beforeEach(() => {
    localStorage.clear();
    reloadLengthUnit();
  });
  afterEach(() => {
    document.body.innerHTML = '';
  });

  it('shows millimetres by default and reads a bare number as millimetres', async () => {
    const wrapper = mountLength(1200);
    const input = wrapper.find('input');
    expect(input.element.value).toBe('1200');

    await input.setValue('1500');

    expect(lastMm(wrapper)).toBe(1500);
  });

  it('shows feet and inches once toggled, and remembers the choice in this browser', async () => {
    const wrapper = mountLength(762);
    useLengthUnit().unit.value = 'ft-in';
    await nextTick();

    // 762 mm = 30 in exactly (1 in = 25.4 mm, international inch)
    expect(wrapper.find('input').element.value).toBe(`2' 6"`);
    expect(localStorage.getItem(LENGTH_UNIT_KEY)).toBe('ft-in');
  });

  it('reads 2\' 6" and a bare number of inches in feet-and-inches mode, and stores millimetres', async () => {
    localStorage.setItem(LENGTH_UNIT_KEY, 'ft-in');
    reloadLengthUnit();
    const wrapper = mountLength(1200);
    const input = wrapper.find('input');

    await input.setValue(`2' 6"`);
    expect(lastMm(wrapper)).toBe(762); // 30 in × 25.4 mm

    await input.setValue('16');
    expect(lastMm(wrapper)).toBe(406.4); // 16 in × 25.4 mm
  });

  it('reports text that is not a length, with the reason, and NaN as the length', async () => {
    const wrapper = mountLength(1200);

    await wrapper.find('input').setValue('two foot');

    expect(lastMm(wrapper)).toBeNaN();
    expect(String(wrapper.emitted('error')?.at(-1)?.[0])).toMatch(/Could not understand/);
  });

  it('keeps the text being typed and tidies it when the field is left', async () => {
    localStorage.setItem(LENGTH_UNIT_KEY, 'ft-in');
    reloadLengthUnit();
    const wrapper = mountLength(762);
    const input = wrapper.find('input');
    await input.trigger('focusin');
    await input.setValue('36in');
    await wrapper.setProps({ modelValue: 914.4 });
    expect(input.element.value).toBe('36in');

    await input.trigger('focusout');

    expect(input.element.value).toBe(`3' 0"`);
  });
});
