import type { FieldErrors, Resolver } from 'react-hook-form';
import { createListingInput, updateListingInput, type CreateListingInput } from '@shared/schemas/listings';
import type { Listing, ListingCondition, RubberUse, UsedGrade } from '../api/listing-types';
import { centsToDollarsText, parseDollarsToCents } from '../utils/money';
import type { PickedPart } from './part-picker';

/** What the form holds: text for numbers (so an empty field means "from the part"), dollars for the price. */
export interface ListingFormValues {
  identified: 'catalog' | 'unidentified';
  part: PickedPart | null;
  title: string;
  condition: ListingCondition | '';
  usedGrade: UsedGrade | '';
  rubberUse: RubberUse | '';
  makersMarks: boolean;
  quantity: string;
  price: string;
  weightGrams: string;
  lengthMm: string;
  widthMm: string;
  heightMm: string;
  shippingProfileId: string;
  description: string;
  descriptionFormat: 'plain' | 'markdown';
}

export const emptyListingForm: ListingFormValues = {
  identified: 'catalog',
  part: null,
  title: '',
  condition: '',
  usedGrade: '',
  rubberUse: '',
  makersMarks: false,
  quantity: '1',
  price: '',
  weightGrams: '',
  lengthMm: '',
  widthMm: '',
  heightMm: '',
  shippingProfileId: '',
  description: '',
  descriptionFormat: 'plain',
};

export function listingToFormValues(l: Listing): ListingFormValues {
  return {
    identified: l.partId ? 'catalog' : 'unidentified',
    part: l.part ? { id: l.part.id, name: l.part.name, number: l.part.primaryNumber ?? '' } : null,
    title: l.title,
    condition: l.condition,
    usedGrade: l.usedGrade ?? '',
    rubberUse: l.rubberUse ?? '',
    makersMarks: l.makersMarks,
    quantity: String(l.quantity),
    price: centsToDollarsText(l.priceCents),
    weightGrams: String(l.weightGrams),
    lengthMm: String(l.lengthMm),
    widthMm: String(l.widthMm),
    heightMm: String(l.heightMm),
    shippingProfileId: l.shippingProfileId ?? '',
    description: l.description,
    descriptionFormat: l.descriptionFormat,
  };
}

const intOrNaN = (s: string) => (/^\d+$/.test(s.trim()) ? Number(s.trim()) : Number.NaN);
const optionalInt = (s: string) => (s.trim() === '' ? null : intOrNaN(s));

/** The request body the form's values stand for (numbers that do not parse stay NaN so the schema names them). */
export function formValuesToInput(v: ListingFormValues): CreateListingInput {
  const cents = parseDollarsToCents(v.price);
  return {
    partId: v.identified === 'catalog' ? (v.part?.id ?? null) : null,
    title: v.title,
    condition: v.condition as ListingCondition,
    usedGrade: v.condition === 'used_original' && v.usedGrade ? v.usedGrade : null,
    rubberUse: v.rubberUse || null,
    makersMarks: v.makersMarks,
    quantity: intOrNaN(v.quantity),
    priceCents: cents ?? Number.NaN,
    weightGrams: optionalInt(v.weightGrams),
    lengthMm: optionalInt(v.lengthMm),
    widthMm: optionalInt(v.widthMm),
    heightMm: optionalInt(v.heightMm),
    shippingProfileId: v.shippingProfileId || null,
    description: v.description,
    descriptionFormat: v.descriptionFormat,
  };
}

/** Schema path -> form field, so the shared schema's messages land on the field the seller sees. */
export const inputToFormField: Record<string, keyof ListingFormValues> = {
  partId: 'part',
  title: 'title',
  condition: 'condition',
  usedGrade: 'usedGrade',
  rubberUse: 'rubberUse',
  makersMarks: 'makersMarks',
  quantity: 'quantity',
  priceCents: 'price',
  weightGrams: 'weightGrams',
  lengthMm: 'lengthMm',
  widthMm: 'widthMm',
  heightMm: 'heightMm',
  shippingProfileId: 'shippingProfileId',
  description: 'description',
  descriptionFormat: 'descriptionFormat',
};

const friendly: Partial<Record<keyof ListingFormValues, string>> = {
  condition: 'Pick the condition',
  quantity: 'Give a whole number',
  price: 'Give the price in dollars, e.g. 42.50',
  weightGrams: 'Give whole grams, or leave empty',
  lengthMm: 'Give whole millimetres, or leave empty',
  widthMm: 'Give whole millimetres, or leave empty',
  heightMm: 'Give whole millimetres, or leave empty',
};

/**
 * Runs the shared zod schema (create: the full rules; edit: the partial one, the server checks the merged
 * listing) on the request body the form stands for, and puts each message on its form field.
 */
export function listingFormResolver(mode: 'create' | 'edit'): Resolver<ListingFormValues> {
  return async (values) => {
    const input = formValuesToInput(values);
    const errors: FieldErrors<ListingFormValues> = {};
    if (values.identified === 'catalog' && !values.part) {
      errors.part = { type: 'required', message: 'Pick the part from the catalog, or choose “Not in the catalog”' };
    }
    const result = mode === 'create' ? createListingInput.safeParse(input) : updateListingInput.safeParse(input);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = inputToFormField[String(issue.path[0] ?? '')];
        if (!field || errors[field]) continue;
        // zod's type messages ("expected number, received NaN") mean the text did not parse.
        const message = issue.code === 'invalid_type' || issue.code === 'invalid_value' ? (friendly[field] ?? issue.message) : issue.message;
        (errors as Record<string, { type: string; message: string }>)[field] = { type: issue.code, message };
      }
    }
    // zod runs the schema's cross-field rules only once every field parses; say the grade rule at once too,
    // in the schema's words, so the seller sees every problem in one go.
    if (!result.success && values.condition === 'used_original' && !values.usedGrade && !errors.usedGrade) {
      errors.usedGrade = { type: 'custom', message: 'Used originals need a grade' };
    }
    return Object.keys(errors).length ? { values: {}, errors } : { values, errors: {} };
  };
}
