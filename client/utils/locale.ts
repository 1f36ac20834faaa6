import en from 'element-plus/es/locale/lang/en';
import type { Language } from 'element-plus/es/locale';
import 'dayjs/locale/en-gb';

/**
 * Element Plus ships English only in its US form. This keeps its words, with a few of our own,
 * and names the locale `en-gb` so date pickers use dayjs's British locale (weeks start on Monday).
 */
export const elementLocale: Language = {
  ...en,
  name: 'en-gb',
  el: {
    ...en.el,
    pagination: { ...en.el.pagination, total: '{total} in all', pagesize: ' per page' },
    drawer: { close: 'Close the menu' },
    tag: { close: 'Remove this filter' },
  },
};

/** Date format for any date picker: 07/03/2026. */
export const PICKER_DATE_FORMAT = 'DD/MM/YYYY';
