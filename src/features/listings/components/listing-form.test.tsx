import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { errorResponse, jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { makeListing, makeListingPage, PART_ID, PROFILE_ID } from '../testing/listing-fixtures';
import { ListingForm } from './listing-form';
import { listingToFormValues } from './listing-form-values';

const profiles = [{ id: PROFILE_ID, name: 'By weight', isDefault: true }];

function partApi() {
  return mockApi({
    'GET /api/parts/resolve': jsonResponse(200, {
      matches: [{ partId: PART_ID, number: 'FX-1001', matchedBy: 'replaced_by', depth: 1 }],
      fillers: [PART_ID],
      parts: [{ id: PART_ID, name: 'Wheel cylinder, front (fictional)', category: 'wheel_cylinder', safetyClass: 'brake', primaryNumber: 'FX-1001' }],
    }),
    'GET /api/search/suggest': errorResponse(404, 'not_found', 'Not found.'),
    [`GET /api/parts/${PART_ID}`]: jsonResponse(200, makeListingPage().part),
  });
}

describe('listing form', () => {
  it('when submitted empty, then the shared schema’s messages show on the fields and nothing is saved', async () => {
    partApi();
    const onSubmit = vi.fn();
    const { user } = renderWithProviders(<ListingForm mode="create" shippingProfiles={profiles} submitLabel="Save draft" isPending={false} onSubmit={onSubmit} />);

    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    expect(await screen.findByText('Pick the part from the catalog, or choose “Not in the catalog”')).toBeInTheDocument();
    expect(screen.getByText('Give a title of at least 3 characters')).toBeInTheDocument();
    expect(screen.getByText('Pick the condition')).toBeInTheDocument();
    expect(screen.getByText('Give the price in dollars, e.g. 42.50')).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when a part is found by an old number and a used original is filled in, then the input carries the part, the grade and cents', async () => {
    const { calls } = partApi();
    const onSubmit = vi.fn().mockResolvedValue(undefined);
    const { user } = renderWithProviders(<ListingForm mode="create" shippingProfiles={profiles} submitLabel="Save draft" isPending={false} onSubmit={onSubmit} />);

    await user.type(screen.getByLabelText('Find the part by number or name'), 'fx 0999');
    await user.click(await screen.findByRole('button', { name: /Wheel cylinder, front \(fictional\)/ }));
    expect(screen.getByText('FX-1001')).toBeInTheDocument();
    // The title takes the part's name until the seller writes their own.
    expect(screen.getByLabelText('Title')).toHaveValue('Wheel cylinder, front (fictional)');
    expect(calls.some((c) => c.path === '/api/parts/resolve')).toBe(true);

    await user.click(screen.getByRole('radio', { name: /Used original/ }));
    await user.click(screen.getByRole('button', { name: 'Save draft' }));
    expect(await screen.findByText('Used originals need a grade')).toBeInTheDocument();

    await user.selectOptions(screen.getByLabelText('Grade (Drabyard scale)'), 'honest');
    await user.selectOptions(screen.getByLabelText('Rubber parts'), 'display_only');
    await user.clear(screen.getByLabelText('Quantity'));
    await user.type(screen.getByLabelText('Quantity'), '3');
    await user.type(screen.getByLabelText('Price each (US$)'), '$1,234.5');
    // The weight placeholder says it comes from the catalog part.
    expect(await screen.findByPlaceholderText('900 g from the part')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0][0]).toEqual({
      partId: PART_ID,
      title: 'Wheel cylinder, front (fictional)',
      condition: 'used_original',
      usedGrade: 'honest',
      rubberUse: 'display_only',
      makersMarks: false,
      quantity: 3,
      priceCents: 123450,
      weightGrams: null,
      lengthMm: null,
      widthMm: null,
      heightMm: null,
      shippingProfileId: PROFILE_ID,
      description: '',
      descriptionFormat: 'plain',
    });
  });

  it('when the part is not in the catalog and the description is short, then the schema asks for a longer description', async () => {
    partApi();
    const onSubmit = vi.fn();
    const { user } = renderWithProviders(<ListingForm mode="create" shippingProfiles={profiles} submitLabel="Save draft" isPending={false} onSubmit={onSubmit} />);

    await user.click(screen.getByRole('radio', { name: /Not in the catalog/ }));
    await user.type(screen.getByLabelText('Title'), 'Brass tag K7');
    await user.click(screen.getByRole('radio', { name: /New old stock/ }));
    await user.type(screen.getByLabelText('Price each (US$)'), '12');
    await user.type(screen.getByLabelText('Description'), 'Brass tag');
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    expect(await screen.findByText(/describe it in at least 20 characters/)).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when the server refuses a field, then its message shows on that field', async () => {
    partApi();
    const onSubmit = vi.fn().mockRejectedValue(
      new ApiError({ status: 400, code: 'validation_failed', message: 'Pick one of your own shipping profiles', details: { fieldErrors: { shippingProfileId: ['Pick one of your own shipping profiles'] } } }),
    );
    const { user } = renderWithProviders(
      <ListingForm mode="edit" defaultValues={listingToFormValues(makeListing())} shippingProfiles={profiles} submitLabel="Save changes" isPending={false} onSubmit={onSubmit} />,
    );

    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByText('Pick one of your own shipping profiles')).toBeInTheDocument();
    expect(screen.getByLabelText('Shipping profile')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
