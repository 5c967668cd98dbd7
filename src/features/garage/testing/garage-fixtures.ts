// Fictional test data for the garage's component tests (invented numbers and shops).
import type { Checklist, ChecklistLine, GarageVehicle, NeedsList, Progress, SourcingPlan } from '../api/garage-schemas';

export const VEHICLE_ID = '0b7c2b44-1f0e-4a53-9d0e-5d9d2c7a1001';
export const ASSEMBLY_ID = '0b7c2b44-1f0e-4a53-9d0e-5d9d2c7a2001';

export function progress(lines: number, byStatus: Progress['byStatus'] = {}): Progress {
  const inspected = Object.entries(byStatus).reduce((a, [s, n]) => (s === 'not_inspected' ? a : a + (n ?? 0)), 0);
  return { lines, inspected, percent: lines ? Math.floor((inspected * 100) / lines) : 0, byStatus: { not_inspected: lines - inspected, ...byStatus } };
}

export function garageVehicle(overrides: Partial<GarageVehicle> = {}): GarageVehicle {
  return {
    id: VEHICLE_ID,
    nickname: '',
    serial: 'KV4-2044',
    serialNumber: 2044,
    buildDate: '1952-03',
    variant: null,
    originalityTarget: 'as_built',
    model: { id: 'm1', slug: 'kv4', name: 'Kestrelvale KV-4', maker: 'Kestrelvale Motor Works (fictional)', model: 'KV-4' },
    createdAt: '2025-03-04T10:00:00.000Z',
    updatedAt: '2025-03-04T10:00:00.000Z',
    ...overrides,
  };
}

export function checklistLine(overrides: Partial<ChecklistLine> & { id: string }): ChecklistLine {
  return {
    callout: '1',
    quantity: 1,
    notes: null,
    uncertain: null,
    part: { id: `part-${overrides.id}`, name: 'Part', category: 'misc', safetyClass: 'none', primaryNumber: 'KV-0000' },
    teardown: { status: 'not_inspected', usableOnHand: 0, note: '', policy: 'any', updatedAt: null, photos: [] },
    needed: 0,
    ...overrides,
  };
}

export function checklist(lines: ChecklistLine[] = defaultLines()): Checklist {
  return {
    vehicleId: VEHICLE_ID,
    serial: 'KV4-2044',
    assembly: { id: ASSEMBLY_ID, code: 'BRK-MC', name: 'Master cylinder', description: '' },
    system: { slug: 'brakes', name: 'Brakes' },
    parent: null,
    children: [],
    cautions: [{ code: 'brake_safety', text: 'Brakes stop the vehicle.' }],
    excluded: [
      {
        line: { id: 'x1', callout: '1', quantity: 1, notes: null, part: { id: 'p-late', name: 'Master cylinder, late', category: 'master_cylinder', safetyClass: 'brake', primaryNumber: 'KV-7702' } },
        reasons: ['Serials from 5000'],
      },
    ],
    progress: progress(3, { replace: 1 }),
    vehicleProgress: progress(120, { replace: 1, reuse: 11 }),
    lines,
  };
}

export function defaultLines(): ChecklistLine[] {
  return [
    checklistLine({
      id: 'line-boot',
      callout: '7',
      quantity: 2,
      part: { id: 'p-boot', name: 'Boot, master cylinder push rod', category: 'boot', safetyClass: 'brake', primaryNumber: 'KV-7718' },
    }),
    checklistLine({
      id: 'line-cap',
      callout: '9',
      quantity: 4,
      part: { id: 'p-cap', name: 'Cap, filler, vented', category: 'cap', safetyClass: 'none', primaryNumber: 'KV-7740' },
      teardown: { status: 'replace', usableOnHand: 1, note: 'Two cracked', policy: 'originals_only', updatedAt: '2025-03-05T09:00:00.000Z', photos: [] },
      needed: 3,
    }),
    checklistLine({
      id: 'line-link',
      callout: '12',
      quantity: 1,
      part: { id: 'p-link', name: 'Drag link end', category: 'joint', safetyClass: 'steering', primaryNumber: 'KV-9120' },
    }),
  ];
}

export function needsList(): NeedsList {
  return {
    vehicleId: VEHICLE_ID,
    serial: 'KV4-2044',
    notInspectedLines: 40,
    totalUnits: 5,
    needs: [
      {
        needId: 'p-cap:originals_only',
        part: { id: 'p-cap', name: 'Cap, filler, vented', primaryNumber: 'KV-7740', category: 'cap' },
        policy: 'originals_only',
        quantity: 3,
        sources: [
          { kind: 'teardown', bomLineId: 'line-cap', assembly: { id: ASSEMBLY_ID, code: 'BRK-MC', name: 'Master cylinder' }, callout: '9', status: 'replace', quantity: 3, note: 'Two cracked' },
        ],
      },
      {
        needId: 'p-hose:any',
        part: { id: 'p-hose', name: 'Hose, front', primaryNumber: 'KV-7801', category: 'brake_hose' },
        policy: 'any',
        quantity: 2,
        sources: [{ kind: 'manual', wantId: 'want-1', quantity: 2, note: 'Spare pair' }],
      },
    ],
  };
}

export function sourcingPlan(overrides: Partial<SourcingPlan> = {}): SourcingPlan {
  return {
    vehicleId: VEHICLE_ID,
    plan: {
      sellers: [
        {
          seller: { id: 's1', name: 'Hollow Creek Salvage' },
          items: [
            {
              needId: 'p-cap:originals_only',
              listingId: 'l1',
              title: 'Filler cap, vented, used original',
              condition: 'used_original',
              partId: 'p-cap',
              partNumber: 'KV-7740',
              forPart: { id: 'p-cap', primaryNumber: 'KV-7740', name: 'Cap, filler, vented' },
              substitute: null,
              quantity: 3,
              unitPriceCents: 800,
              lineCents: 2400,
            },
          ],
          itemsCents: 2400,
          shippingCents: 900,
          shipments: [{ profileName: 'US & Canada by weight', shippingCents: 900, explanation: '0.3 kg: up to 0.5 kg band' }],
        },
      ],
      itemsCents: 2400,
      shippingCents: 900,
      totalCents: 3300,
    },
    unfilled: [
      {
        needId: 'p-hose:any',
        part: { id: 'p-hose', name: 'Hose, front', primaryNumber: 'KV-7801' },
        policy: 'any',
        requested: 2,
        filled: 0,
        missing: 2,
        reason: 'does_not_ship',
        detail: 'No seller of an acceptable listing ships to GB.',
      },
    ],
    method: 'heuristic',
    optimal: false,
    lowerBoundCents: 3000,
    gapCents: 300,
    gapPercent: 9.09,
    ...overrides,
  };
}
