import { inject, provide, type InjectionKey } from 'vue';

/** What the sell form's field components need from the form around them. */
export interface SellFormLike {
  draft: Record<string, unknown>;
  errors: Record<string, string>;
  field(key: string): { id: string; error: string | undefined; onBlur: () => void };
  fieldId(key: string): string;
}

const KEY: InjectionKey<SellFormLike> = Symbol('sell-form');

/** Hand the form to the field components below (module, service or builder application). */
export function provideSellForm(form: SellFormLike): void {
  provide(KEY, form);
}

export function useSellForm(): SellFormLike {
  const form = inject(KEY);
  if (!form) throw new Error('A sell form field was used outside a sell form.');
  return form;
}
