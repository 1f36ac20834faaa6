import { PlanInputError } from '../errors';
import { PlannerInputError } from '../packing/errors';

/** The input field a packing refusal points at: the stock lengths, the sheet size, or the boards. */
const FIELD_BY_CODE: Readonly<Record<string, string>> = {
  'part-too-long': 'construction.stockLengthsMm',
  'part-too-large': 'construction.sheetSizeMm',
  'too-many-pieces': 'boards',
  'invalid-input': '',
};

/** Runs a packer, turning its refusal into a {@link PlanInputError} at the field the user can change. */
export function withPlanFields<T>(pack: () => T): T {
  try {
    return pack();
  } catch (error) {
    if (error instanceof PlannerInputError)
      throw PlanInputError.forField(FIELD_BY_CODE[error.code] ?? '', error.message);
    throw error;
  }
}
