import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { PHOTO_MESSAGES } from '@shared/listings/photo-limits';
import type { PhotoView } from '@shared/types/listings';
import PhotoManageList from '@/components/photos/PhotoManageList.vue';
import PhotoUploader from '@/components/photos/PhotoUploader.vue';
import { useAuthStore } from '@/stores/auth';
import { FakeXhr } from './support/fake-xhr';
import { stubApi } from './support/fetch-stub';
import { buildPhoto } from './support/listings';
import { buildSession } from './support/users';

const file = (name: string) => new File([new Uint8Array(2048)], name, { type: 'image/jpeg' });

function mountUploader(photos: PhotoView[] = []) {
  const pinia = createPinia();
  setActivePinia(pinia);
  useAuthStore().setSession(buildSession('member'));
  const model = { photos };
  const wrapper = mount(PhotoUploader, {
    props: {
      listingId: 5,
      modelValue: photos,
      'onUpdate:modelValue': (next: PhotoView[]) => {
        model.photos = next;
        void wrapper.setProps({ modelValue: next });
      },
    },
    global: { plugins: [pinia], stubs: { PhotoManageList: true } },
    attachTo: document.body,
  });
  return { wrapper, model };
}

async function choose(wrapper: ReturnType<typeof mountUploader>['wrapper'], files: File[]) {
  const input = wrapper.find('input[type="file"]');
  Object.defineProperty(input.element, 'files', { value: files, configurable: true });
  await input.trigger('change');
  await flushPromises();
}

describe('the photo uploader', () => {
  beforeEach(() => {
    FakeXhr.made = [];
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('sends each file on its own as the field "photo", with the CSRF token, and shows its progress', async () => {
    const { wrapper, model } = mountUploader();
    await choose(wrapper, [file('board-top.jpg')]);

    const xhr = FakeXhr.made[0]!;
    expect([xhr.method, xhr.url]).toEqual(['POST', '/api/listings/5/photos']);
    expect(xhr.headers['X-CSRF-Token']).toBe('token-from-session');
    expect((xhr.body as FormData).get('photo')).toBeInstanceOf(File);

    xhr.progress(512, 2048);
    await flushPromises();
    expect(wrapper.text()).toContain('25% sent');

    xhr.answer(201, { photo: buildPhoto(9, 1), photos: [buildPhoto(9, 1)] });
    await flushPromises();
    expect(model.photos.map((p) => p.id)).toEqual([9]);
    expect(wrapper.find('.photo-upload-item').exists()).toBe(false);
  });

  it('keeps a refused file with the server’s own words, lets the others through, and retries it', async () => {
    const { wrapper, model } = mountUploader();
    await choose(wrapper, [file('notes.jpg'), file('board-side.jpg')]);

    FakeXhr.made[0]!.answer(415, { error: { code: 'photo_type', message: PHOTO_MESSAGES.wrongType } });
    await flushPromises();
    FakeXhr.made[1]!.answer(201, { photo: buildPhoto(9, 1), photos: [buildPhoto(9, 1)] });
    await flushPromises();

    const failed = wrapper.find('.photo-upload-item.is-failed');
    expect(failed.text()).toContain('notes.jpg');
    expect(failed.find('[role="alert"]').text()).toBe(PHOTO_MESSAGES.wrongType);
    expect(model.photos.map((p) => p.id)).toEqual([9]);

    await failed
      .findAll('button')
      .find((b) => b.text().startsWith('Try again'))!
      .trigger('click');
    await flushPromises();
    expect(FakeXhr.made).toHaveLength(3);
    FakeXhr.made[2]!.answer(201, { photo: buildPhoto(10, 2), photos: [buildPhoto(9, 1), buildPhoto(10, 2)] });
    await flushPromises();
    expect(model.photos.map((p) => p.id)).toEqual([9, 10]);
    expect(wrapper.find('.photo-upload-item').exists()).toBe(false);
  });

  it('refuses a file over 10 MB before sending it, in the server’s words', async () => {
    const { wrapper } = mountUploader();
    const big = new File([new Uint8Array(10 * 1024 * 1024 + 1)], 'huge.jpg', { type: 'image/jpeg' });
    await choose(wrapper, [big]);

    expect(FakeXhr.made).toHaveLength(0);
    expect(wrapper.find('.photo-upload-item [role="alert"]').text()).toBe(PHOTO_MESSAGES.tooLarge);
  });
});

describe('putting photos in order', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('moves a photo later with a button, saves the new order and keeps focus on the moved photo', async () => {
    const photos = [buildPhoto(1, 1), buildPhoto(2, 2), buildPhoto(3, 3)];
    const reordered = [buildPhoto(2, 1, false), buildPhoto(1, 2, true), buildPhoto(3, 3, false)];
    const fetchStub = stubApi({ 'PUT /api/listings/5/photos/order': { body: { photos: reordered } } });
    const wrapper = mount(PhotoManageList, {
      props: {
        listingId: 5,
        modelValue: photos,
        'onUpdate:modelValue': (next: PhotoView[]) => void wrapper.setProps({ modelValue: next }),
      },
      attachTo: document.body,
    });

    const buttons = wrapper.findAll('li')[0]!.findAll('button');
    expect(buttons.find((b) => b.text().startsWith('‹ Earlier'))!.attributes('disabled')).toBeDefined();
    await buttons.find((b) => b.text().startsWith('Later'))!.trigger('click');
    await flushPromises();

    expect(JSON.parse(String(fetchStub.mock.calls[0]?.[1]?.body))).toEqual({ photoIds: [2, 1, 3] });
    expect(wrapper.findAll('img').map((img) => img.attributes('src'))).toEqual([
      '/api/photos/key2/thumb.jpg',
      '/api/photos/key1/thumb.jpg',
      '/api/photos/key3/thumb.jpg',
    ]);
    expect(document.activeElement?.id).toBe('photo-1-later');
    expect(wrapper.find('[role="status"]').text()).toBe('Photo moved to place 2 of 3.');
  });
});
