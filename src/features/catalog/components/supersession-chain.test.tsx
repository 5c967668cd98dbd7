import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import type { SupersessionChain as Chain } from '../api/catalog-schemas';
import { PART_EARLY, PART_LATE, PART_NEWER, partReply } from '../testing/catalog-fixtures';
import { SupersessionChain } from './supersession-chain';

const chain = partReply().chain;
const edgeGroup = (kind: string) => document.querySelector(`g[data-interchange="${kind}"]`)!;
const steps = () => within(screen.getByRole('list', { name: 'Supersession steps' })).getAllByRole('listitem');

describe('supersession chain drawing', () => {
  it('when a step is two-way, then its arrow has heads at both ends; when one-way, only at the newer end', () => {
    renderWithProviders(<SupersessionChain chain={chain} partId={PART_EARLY} />);

    const twoWay = edgeGroup('two_way').querySelector('path')!;
    const oneWay = edgeGroup('one_way').querySelector('path')!;
    expect(twoWay.getAttribute('marker-start')).toMatch(/^url\(#.+-start\)$/);
    expect(twoWay.getAttribute('marker-end')).toMatch(/-end\)$/);
    expect(oneWay.getAttribute('marker-start')).toBeNull();
    expect(oneWay.getAttribute('marker-end')).toMatch(/-end\)$/);
    expect(edgeGroup('two_way')).toHaveTextContent('⇄');
    expect(edgeGroup('one_way')).toHaveTextContent('→');

    expect(steps()[0]).toHaveTextContent('FV-20417 Master cylinder, early (this part) is replaced by FV-26602 Master cylinder, late — two-way ⇄');
    expect(steps()[1]).toHaveTextContent('is replaced by FV-26602A Master cylinder, revised — one-way →: one-way: the newer part fits where the older did, not the reverse');
  });

  it('when drawn, then older parts sit left of newer ones, the current part and this part are marked', () => {
    renderWithProviders(<SupersessionChain chain={chain} partId={PART_LATE} />);
    const left = (id: string) => parseFloat((document.querySelector(`[data-part-node="${id}"]`) as HTMLElement).style.left);
    expect(left(PART_EARLY)).toBeLessThan(left(PART_LATE));
    expect(left(PART_LATE)).toBeLessThan(left(PART_NEWER));
    expect(document.querySelector(`[data-part-node="${PART_NEWER}"]`)).toHaveTextContent('Current');
    expect(document.querySelector(`[data-part-node="${PART_LATE}"]`)).toHaveTextContent('This part');
  });

  it('when a step is conditional, then it is dashed, numbered, and its condition is spelled out', () => {
    const conditional: Chain = {
      ...chain,
      edges: [{ id: 'c1', fromPartId: PART_EARLY, toPartId: PART_LATE, interchange: 'conditional', note: 'Needs the late bracket.', quantity: 1 }],
      parts: chain.parts.slice(0, 2),
      current: [PART_LATE],
    };
    renderWithProviders(<SupersessionChain chain={conditional} partId={PART_EARLY} />);
    expect(edgeGroup('conditional').querySelector('path')).toHaveAttribute('stroke-dasharray', '6 4');
    expect(edgeGroup('conditional')).toHaveTextContent('→ if 1');
    expect(within(screen.getByRole('list', { name: 'Conditions' })).getByText('Needs the late bracket.')).toBeInTheDocument();
  });

  it('when one part is replaced by a kit, then the members are boxed together with their quantities', () => {
    const ids = ['k1', 'k2', 'k3'];
    const kit: Chain = {
      parts: [chain.parts[0], ...ids.map((id, i) => ({ id, name: `Kit member ${i + 1}`, category: 'seal', safetyClass: 'brake' as const, primaryNumber: `FK-${i}` }))],
      edges: ids.map((id, i) => ({ id: `e${i}`, fromPartId: PART_EARLY, toPartId: id, interchange: 'one_way' as const, note: null, quantity: i === 2 ? 1 : 2 })),
      current: ids,
      fillers: [PART_EARLY],
      problems: [],
    };
    renderWithProviders(<SupersessionChain chain={kit} partId={PART_EARLY} />);
    expect(screen.getByText('Kit of 3, replaces FV-20417')).toBeInTheDocument();
    expect(steps()[0]).toHaveTextContent('is replaced by 2 × FK-0 Kit member 1');
    expect(document.querySelectorAll('g[data-interchange="one_way"]')[0]).toHaveTextContent('→ one-way ×2');
  });

  it('when the data loops, then a warning shows and the closing step is drawn once as a loop', () => {
    const loop: Chain = {
      ...chain,
      edges: [...chain.edges, { id: 'e3', fromPartId: PART_NEWER, toPartId: PART_EARLY, interchange: 'two_way', note: null, quantity: 1 }],
      current: [],
      problems: [{ kind: 'loop', message: `Supersession loop: ${PART_EARLY}, ${PART_LATE}, ${PART_NEWER} replace each other in a circle.`, partIds: [PART_EARLY, PART_LATE, PART_NEWER] }],
    };
    renderWithProviders(<SupersessionChain chain={loop} partId={PART_EARLY} />);
    expect(screen.getByRole('alert')).toHaveTextContent('This chain loops back on itself');
    // Ids in the server's message are shown as the parts' numbers.
    expect(screen.getByRole('alert')).toHaveTextContent('Supersession loop: FV-20417, FV-26602, FV-26602A replace each other in a circle.');
    expect(document.querySelectorAll('g[data-loop="true"]')).toHaveLength(1);
    expect(steps()).toHaveLength(3);
  });

  it('when the part has no supersession, then that is said in words', () => {
    renderWithProviders(<SupersessionChain chain={{ ...chain, edges: [], parts: [chain.parts[0]], current: [] }} partId={PART_EARLY} />);
    expect(screen.getByText(/No supersession is recorded/)).toBeInTheDocument();
  });
});
