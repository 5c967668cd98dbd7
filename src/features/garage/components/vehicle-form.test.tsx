import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { errorResponse, jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { garageVehicle } from '../testing/garage-fixtures';
import { VehicleForm } from './vehicle-form';

const kv4 = {
  id: 'm1',
  slug: 'kv4',
  name: 'Kestrelvale KV-4',
  maker: 'Kestrelvale Motor Works (fictional)',
  model: 'KV-4',
  yearFrom: 1950,
  yearTo: 1956,
  serialPrefix: 'KV4-',
  serialFrom: 1001,
  serialTo: 18750,
  description: '',
  assemblyCount: 50,
};

function api(post: Parameters<typeof mockApi>[0][string]) {
  return mockApi({
    'GET /api/vehicles': jsonResponse(200, { vehicles: [kv4] }),
    'GET /api/vehicles/kv4': jsonResponse(200, { vehicle: kv4, variants: [{ code: 'W', name: 'With front winch', description: '' }], systems: [] }),
    'POST /api/garage/vehicles': post,
  });
}

describe('add-vehicle form', () => {
  it('when the restorer fills model, serial and target, then the shared schema shapes the request (empty date and variant are null)', async () => {
    const { calls } = api(jsonResponse(201, { vehicle: garageVehicle() }));
    const onCreated = vi.fn();
    const { user } = renderWithProviders(<VehicleForm onCreated={onCreated} />);

    await screen.findByRole('option', { name: /Kestrelvale KV-4/ });
    await user.selectOptions(screen.getByLabelText('Vehicle model'), 'kv4');
    expect(await screen.findByText('As stamped on the data plate: KV4-1001 to KV4-18750.')).toBeInTheDocument();
    await user.type(screen.getByLabelText('Serial number'), ' KV4-2044 ');
    await user.click(screen.getByRole('radio', { name: /Usable driver/ }));
    await user.click(screen.getByRole('button', { name: 'Add vehicle' }));

    await waitFor(() => expect(onCreated).toHaveBeenCalledOnce());
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      vehicleSlug: 'kv4',
      nickname: '',
      serial: 'KV4-2044',
      buildDate: null,
      variant: null,
      originalityTarget: 'usable_driver',
    });
  });

  it('when the server refuses the serial, then its message shows on the serial field', async () => {
    api(
      errorResponse(400, 'validation_failed', 'Check the fields', {
        fieldErrors: { serial: ['Kestrelvale KV-4 serials run from KV4-1,001 to KV4-18,750; check the data plate'] },
      }),
    );
    const { user } = renderWithProviders(<VehicleForm />);
    await screen.findByRole('option', { name: /Kestrelvale KV-4/ });
    await user.selectOptions(screen.getByLabelText('Vehicle model'), 'kv4');
    await user.type(screen.getByLabelText('Serial number'), 'KV4-99999');
    await user.click(screen.getByRole('button', { name: 'Add vehicle' }));
    expect(await screen.findByText(/serials run from KV4-1,001 to KV4-18,750/)).toBeInTheDocument();
    expect(screen.getByLabelText('Serial number')).toHaveAttribute('aria-invalid', 'true');
  });

  it('when no model is picked, then the form says so and sends nothing', async () => {
    const { calls } = api(jsonResponse(201, { vehicle: garageVehicle() }));
    const { user } = renderWithProviders(<VehicleForm />);
    await screen.findByRole('option', { name: /Kestrelvale KV-4/ });
    await user.click(screen.getByRole('button', { name: 'Add vehicle' }));
    expect(await screen.findByText('Pick a vehicle model')).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });
});
