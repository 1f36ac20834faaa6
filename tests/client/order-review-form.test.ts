import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import type { OrderReviewsView } from '@shared/types/reviews';
import OrderReviewForm from '@/components/reviews/OrderReviewForm.vue';
import { routes } from '@/router/routes';
import { stubApi } from './support/fetch-stub';

const open: OrderReviewsView = { orderId: 12, side: 'buyer', canReview: true, mine: null, theirs: null };
const mine = {
  id: 5,
  author: { id: 3, displayName: 'Nell Fishplate' },
  authorRole: 'buyer' as const,
  stars: 4,
  text: '<b>Good</b> module',
  at: '2026-11-30T10:00:00.000Z',
  hidden: false,
};

async function mountForm(answers: Parameters<typeof stubApi>[0]) {
  const fetchStub = stubApi(answers);
  const router = createRouter({ history: createMemoryHistory(), routes });
  const wrapper = mount(OrderReviewForm, {
    props: { orderId: 12 },
    global: { plugins: [createPinia(), router] },
    attachTo: document.body,
  });
  await flushPromises();
  return { wrapper, fetchStub };
}

const postBodies = (fetchStub: ReturnType<typeof stubApi>) =>
  fetchStub.mock.calls.filter(([, init]) => init?.method === 'POST').map(([, init]) => JSON.parse(String(init!.body)));

describe('the order review form', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('sends the chosen stars and words, then shows what was sent as text', async () => {
    const { wrapper, fetchStub } = await mountForm({
      'GET /api/orders/12/reviews': { body: open },
      'POST /api/orders/12/review': { status: 201, body: { ...open, canReview: false, mine } },
    });
    expect(wrapper.text()).toContain('Rate this purchase');

    await wrapper.find('input[type="radio"][value="4"]').setValue(true);
    await wrapper.find('textarea').setValue('<b>Good</b> module');
    await wrapper.find('form').trigger('submit');
    await flushPromises();

    expect(postBodies(fetchStub)).toEqual([{ stars: 4, text: '<b>Good</b> module' }]);
    expect(wrapper.text()).toContain('Thank you. You gave the seller');
    expect(wrapper.text()).toContain('<b>Good</b> module');
    expect(wrapper.find('b').exists()).toBe(false);
  });

  it('names the missing stars beside the field and sends nothing', async () => {
    const { wrapper, fetchStub } = await mountForm({ 'GET /api/orders/12/reviews': { body: open } });

    await wrapper.find('textarea').setValue('Arrived well packed.');
    await wrapper.find('form').trigger('submit');
    await flushPromises();

    expect(wrapper.find('#order-review-12-stars-error').text()).toBe('Choose from 1 to 5 stars.');
    expect(postBodies(fetchStub)).toEqual([]);
  });

  it('shows the server’s refusal and keeps what was typed', async () => {
    const { wrapper } = await mountForm({
      'GET /api/orders/12/reviews': { body: open },
      'POST /api/orders/12/review': {
        status: 409,
        body: { error: { code: 'already_reviewed', message: 'You have already rated this order.' } },
      },
    });

    await wrapper.find('input[type="radio"][value="5"]').setValue(true);
    await wrapper.find('textarea').setValue('Superb.');
    await wrapper.find('form').trigger('submit');
    await flushPromises();

    expect(wrapper.text()).toContain('You have already rated this order.');
    expect(wrapper.find<HTMLTextAreaElement>('textarea').element.value).toBe('Superb.');
  });

  it('tells a side of an order not yet paid out that rating comes later', async () => {
    const { wrapper } = await mountForm({
      'GET /api/orders/12/reviews': { body: { ...open, side: 'seller', canReview: false } },
    });

    expect(wrapper.text()).toContain('Rate this sale');
    expect(wrapper.text()).toContain('You can rate this sale once the seller has been paid out.');
    expect(wrapper.find('form').exists()).toBe(false);
  });
});
