import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { sourcingPlan, VEHICLE_ID } from '../testing/garage-fixtures';
import { PlanView, SourcingPlanner } from './sourcing-plan';

const planPath = `POST /api/garage/vehicles/${VEHICLE_ID}/plan`;
const cartPath = `POST /api/garage/vehicles/${VEHICLE_ID}/plan/to-cart`;

describe('sourcing plan', () => {
  it('when a plan cannot fill a need, then the need is listed with the reason and its detail', () => {
    renderWithProviders(<PlanView plan={sourcingPlan()} />);
    const unfilled = screen.getByRole('heading', { name: 'Cannot be filled (1)' }).closest('section')!;
    expect(within(unfilled).getByText('KV-7801')).toBeInTheDocument();
    expect(within(unfilled).getByText('Does not ship to you')).toBeInTheDocument();
    expect(within(unfilled).getByText(/No seller of an acceptable listing ships to GB\. Wanted 2 \(any condition\), found 0, missing 2\./)).toBeInTheDocument();
  });

  it('when the search stopped at its budget, then the gap to the lower bound is shown in money and percent', () => {
    renderWithProviders(<PlanView plan={sourcingPlan()} />);
    expect(screen.getByTestId('plan-gap')).toHaveTextContent('Best found within the search budget. Lower bound $30.00; gap $3.00 (9.09%).');
    expect(within(screen.getByRole('region', { name: 'Plan totals' })).getByText('$33.00')).toBeInTheDocument();
  });

  it('when the plan is proven optimal, then it says so and the gap is zero', () => {
    renderWithProviders(<PlanView plan={sourcingPlan({ optimal: true, method: 'exact', lowerBoundCents: 3300, gapCents: 0, gapPercent: 0, unfilled: [] })} />);
    expect(screen.getByTestId('plan-gap')).toHaveTextContent('Proven cheapest');
    expect(screen.getByTestId('plan-gap')).toHaveTextContent('gap $0.00 (0.00%)');
    expect(screen.queryByRole('heading', { name: /Cannot be filled/ })).not.toBeInTheDocument();
  });

  it('when the restorer builds the plan for pickup and puts it in the cart, then both calls carry that destination and the result shows', async () => {
    const plan = sourcingPlan();
    const { calls } = mockApi({
      [planPath]: jsonResponse(200, plan),
      [cartPath]: jsonResponse(200, { added: [{ listingId: 'l1', quantity: 3 }], warnings: [], plan }),
    });
    const { user } = renderWithProviders(<SourcingPlanner vehicleId={VEHICLE_ID} />);

    await user.selectOptions(screen.getByLabelText('Ship to'), 'pickup');
    await user.click(screen.getByRole('button', { name: 'Build the plan' }));
    const seller = await screen.findByRole('region', { name: 'From Hollow Creek Salvage' });
    expect(within(seller).getByRole('link', { name: 'Filler cap, vented, used original' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Put the plan in the cart' }));
    expect(await screen.findByText('Added 3 units from 1 listing to your cart')).toBeInTheDocument();
    await waitFor(() => expect(calls.map((c) => `${c.method} ${c.path}`)).toEqual([planPath, cartPath]));
    expect(calls.every((c) => JSON.stringify(c.body) === JSON.stringify({ destination: { pickup: true } }))).toBe(true);
  });
});
