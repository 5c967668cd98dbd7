import { act, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorResponse, jsonResponse, meHandler, mockApi, renderApp } from '@/testing/test-utils';
import { ASSEMBLY_ID, assemblyReply, cap, early, screw } from '../testing/catalog-fixtures';

const url = `/catalog/assemblies/${ASSEMBLY_ID}`;

function serveAssembly() {
  return mockApi({
    'GET /api/auth/me': meHandler(null),
    [`GET /api/assemblies/${ASSEMBLY_ID}`]: ({ url: requestUrl }) => {
      const serial = requestUrl.searchParams.get('serial');
      if (serial === null) return jsonResponse(200, assemblyReply());
      if (!/\d/.test(serial)) return errorResponse(400, 'validation_failed', 'A serial number needs digits', { fieldErrors: { serial: ['A serial number needs digits'] } });
      const base = assemblyReply();
      return jsonResponse(200, {
        ...base,
        filter: { serial: Number(serial), buildDate: null, variant: null },
        lines: base.lines.filter((l) => l.id !== 'l2'),
        excluded: [{ line: { ...base.lines[1], uncertain: undefined }, reasons: [`applies to serials from 5,000 on; this vehicle is ${serial}`] }],
      });
    },
  });
}

const rowOf = (name: string) => screen.getByRole('rowheader', { name: new RegExp(name) }).closest('tr')!;
const hotspot = (callout: string) => screen.getByRole('button', { name: new RegExp(`^Callout ${callout}: `) });

describe('assembly page', () => {
  it('when a callout on the diagram is focused and Enter is pressed, then its parts-list rows light up and the part shows with a link', async () => {
    serveAssembly();
    const { user } = renderApp(url);
    const diagram = await screen.findByRole('group', { name: 'Exploded diagram: Master cylinder' });

    // Keyboard path: the diagram takes focus, Tab moves onto the callouts in number order.
    act(() => diagram.focus());
    await user.tab();
    expect(hotspot('1')).toHaveFocus();
    expect(hotspot('1')).toHaveAccessibleName('Callout 1: Master cylinder, early or Master cylinder, late');
    await user.tab();
    expect(hotspot('2')).toHaveFocus();
    expect(rowOf(cap.name)).toHaveAttribute('data-state', 'highlighted');
    expect(rowOf(early.name)).not.toHaveAttribute('data-state');

    await user.keyboard('{Enter}');
    expect(hotspot('2')).toHaveAttribute('aria-pressed', 'true');
    expect(rowOf(cap.name)).toHaveAttribute('data-state', 'selected');
    const panel = screen.getByRole('region', { name: 'Selected callout' });
    expect(within(panel).getByText(cap.name)).toBeInTheDocument();
    expect(within(panel).getByRole('link', { name: `Open the part page: ${cap.name}` })).toHaveAttribute('href', `/catalog/parts/${cap.id}`);

    // Space toggles it off again.
    await user.keyboard(' ');
    expect(hotspot('2')).toHaveAttribute('aria-pressed', 'false');
  });

  it('when a parts-list row is focused or picked, then its callout on the diagram lights up', async () => {
    serveAssembly();
    const { user } = renderApp(url);
    await screen.findByRole('group', { name: /Exploded diagram/ });

    const rowButton = within(rowOf(screw.name)).getByRole('button', { name: 'Show callout 10 on the diagram' });
    act(() => rowButton.focus());
    expect(hotspot('10')).toHaveAttribute('data-state', 'highlighted');
    await user.keyboard('{Enter}');
    expect(hotspot('10')).toHaveAttribute('data-state', 'selected');
    expect(hotspot('10')).toHaveAttribute('aria-pressed', 'true');
    // The drawing's own bubble for callout 10 is marked too.
    expect(document.querySelector('g[aria-hidden="true"] [data-callout="10"]')).toHaveAttribute('data-state', 'selected');

    await user.hover(rowOf(cap.name));
    expect(hotspot('2')).toHaveAttribute('data-state', 'highlighted');
  });

  it('when the diagram holds a script, then it never reaches the page', async () => {
    serveAssembly();
    renderApp(url);
    await screen.findByRole('group', { name: /Exploded diagram/ });
    expect(document.querySelector('script')).toBeNull();
    expect(document.querySelectorAll('g[aria-hidden="true"] [data-callout]')).toHaveLength(3);
  });

  it('when zoomed with the buttons and panned with the arrow keys, then the viewBox follows and 0 resets it', async () => {
    serveAssembly();
    const { user } = renderApp(url);
    const diagram = await screen.findByRole('group', { name: /Exploded diagram/ });
    expect(diagram).toHaveAttribute('viewBox', '0 0 800 600');
    expect(screen.getByRole('button', { name: 'Zoom out' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Zoom in' }));
    expect(diagram).toHaveAttribute('viewBox', '80 60 640 480');
    act(() => diagram.focus());
    await user.keyboard('{ArrowRight}');
    expect(diagram).toHaveAttribute('viewBox', '144 60 640 480');
    await user.keyboard('+');
    expect(diagram.getAttribute('viewBox')!.split(' ').map(Number)[2]).toBeCloseTo(512);
    await user.keyboard('0');
    expect(diagram).toHaveAttribute('viewBox', '0 0 800 600');
  });

  it('when a serial is entered, then it is written to the URL, sent to the API and the lines that do not apply fold away with their reasons', async () => {
    const { calls } = serveAssembly();
    const { user, router } = renderApp(url);

    await user.type(await screen.findByLabelText('Vehicle serial number'), '4210');
    await user.click(screen.getByRole('button', { name: 'Show what applies' }));

    expect(await screen.findByText('Showing what applies to serial 4210')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?serial=4210');
    expect(calls.some((c) => c.path === `/api/assemblies/${ASSEMBLY_ID}`)).toBe(true);
    expect(screen.queryByRole('rowheader', { name: /Master cylinder, late/ })).not.toBeInTheDocument();
    const excluded = screen.getByText('Not on this vehicle (1)').closest('details')!;
    expect(within(excluded).getByText(/this vehicle is 4210/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Show all lines' }));
    expect(router.state.location.search).toBe('');
    expect(await screen.findByRole('rowheader', { name: /Master cylinder, late/ })).toBeInTheDocument();
  });

  it('when a serial has no digits, then the form refuses it and the URL stays as it was', async () => {
    serveAssembly();
    const { user, router } = renderApp(url);
    await user.type(await screen.findByLabelText('Vehicle serial number'), 'abc');
    await user.click(screen.getByRole('button', { name: 'Show what applies' }));
    expect(await screen.findByText('A serial number needs digits')).toBeInTheDocument();
    expect(router.state.location.search).toBe('');
  });

  it('when the page opens with a serial in the URL, then the field shows it and the list is filtered', async () => {
    serveAssembly();
    renderApp(`${url}?serial=4210`);
    expect(await screen.findByText('Showing what applies to serial 4210')).toBeInTheDocument();
    expect(screen.getByLabelText('Vehicle serial number')).toHaveValue('4210');
  });
});
