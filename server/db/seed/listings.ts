// Fictional demo data: invented shops, prices and listings on the fictional demo catalog.
// Demo listings for the two demo sellers: shop profiles, one shipping profile each, ~60 listings across every
// condition and state (several on the master cylinder assembly's parts and on superseded numbers'
// replacements) and a few listings with drawn demo photos. Idempotent: every row has a fixed id derived from
// its name and is inserted only when missing.
import { createHash } from 'node:crypto';
import { and, eq, inArray, isNotNull } from 'drizzle-orm';
import sharp from 'sharp';
import type { Db } from '../client';
import { listingEvents, listingPhotos, listings, parts, sellerProfiles, shippingProfiles, users } from '../schema/index';
import { shippingProfileSchema } from '../../domain/shipping';
import { processUpload, photoSizeNames } from '../../lib/photos/pipeline';
import { photoKey } from '../../lib/photos/storage';
import { renderDescription } from '../../services/listing-description';
import { refreshFlags } from '../../services/listing-flags';
import { getPhotoStorage } from '../../services/listing-photos';

/** A fixed UUID (version-4 shaped, so request validation accepts it) for a demo row name. */
export function demoId(name: string): string {
  const h = createHash('sha256').update(`drabyard-demo:${name}`).digest('hex');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-4${h.slice(13, 16)}-${((parseInt(h[16], 16) & 3) | 8).toString(16)}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

const SELLERS = ['seller@drabyard.test', 'seller2@drabyard.test'] as const;

const SHOPS = [
  {
    shopName: 'Hollow Creek Salvage',
    location: 'Marlow Flats, Ohio',
    country: 'US',
    shipsTo: ['US', 'CA'],
    pickupAtShows: false,
    showsNote: '',
    returnPolicy: 'Returns within 14 days if a part is not as described; the buyer pays return shipping otherwise. Cores are sold as seen.',
  },
  {
    shopName: 'Bramble & Sons Reproductions',
    location: 'Kettering Vale, Ontario',
    country: 'CA',
    shipsTo: ['CA', 'US'],
    pickupAtShows: true,
    showsNote: 'Pickup at the spring and autumn swap meets at Kettering Vale fairground (fictional); message us first.',
    returnPolicy: 'Unused reproductions may be returned within 30 days. Rebuilt units carry a one-year warranty against leaks.',
  },
];

const SHIPPING = [
  {
    name: 'US & Canada by weight',
    rules: {
      kind: 'weight_bands',
      bands: [
        { upToGrams: 500, amountCents: 900 },
        { upToGrams: 2000, amountCents: 1600 },
        { upToGrams: 10000, amountCents: 3200 },
      ],
      overMaxCents: 6500,
      shipsTo: ['US', 'CA'],
      pickupAvailable: false,
      dimDivisor: 'carrier_139',
    },
  },
  {
    name: 'Flat per order, free over $150, pickup at shows',
    rules: { kind: 'flat_per_order', amountCents: 1500, freeAboveCents: 15000, shipsTo: ['CA', 'US'], pickupAvailable: true, dimDivisor: 'carrier_139' },
  },
];

type Cond = 'nos' | 'nors' | 'used_original' | 'rebuilt' | 'reproduction' | 'core';
type State = 'draft' | 'submitted' | 'approved' | 'changes_requested' | 'sold_out' | 'withdrawn';
type Drawing = 'cylinder' | 'kit' | 'hose' | 'cap' | 'pedal' | 'plate';

interface Spec {
  /** Part seed key; null for an unidentified part. */
  part: string | null;
  seller: 0 | 1;
  condition: Cond;
  grade?: 'ready' | 'honest' | 'weathered' | 'hard_used' | 'donor';
  rubber?: 'serviceable' | 'display_only';
  state: State;
  qty: number;
  cents: number;
  title?: string;
  description?: string;
  marks?: boolean;
  photo?: Drawing;
  message?: string;
}

const RUBBER_OLD = 'Old stock rubber: offered for display or authenticity only, not for use on a driven vehicle.';
const REBUILT = 'Rebuilt in our shop: bore honed and checked, every rubber part renewed with new cups, seals and boots, pressure tested.';

// The master cylinder assembly (kv4 and st25), the superseded numbers' replacements (master-late, hose-front),
// other brake, steering and hardware parts, and a few listings in review and other states.
const SPECS: Spec[] = [
  { part: 'kv4.brakes.master-early', seller: 0, condition: 'used_original', grade: 'honest', rubber: 'display_only', state: 'approved', qty: 1, cents: 6500, marks: true, photo: 'cylinder', description: `Pulled from a parts truck; casting number and maker's script are clear. ${RUBBER_OLD}` },
  { part: 'kv4.brakes.master-early', seller: 0, condition: 'core', rubber: 'display_only', state: 'approved', qty: 2, cents: 2800, description: 'Seized but the casting is sound: good rebuild cores. No cracks at the outlet boss.' },
  { part: 'kv4.brakes.master-late', seller: 1, condition: 'rebuilt', rubber: 'serviceable', state: 'approved', qty: 3, cents: 18500, photo: 'cylinder', description: REBUILT },
  { part: 'kv4.brakes.master-late', seller: 0, condition: 'nos', rubber: 'display_only', state: 'approved', qty: 1, cents: 21000, marks: true, description: `Still in the waxed carton. ${RUBBER_OLD}` },
  { part: 'kv4.brakes.master-late', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 4, cents: 14900, description: 'New manufacture to the late pattern, with new rubber throughout.' },
  { part: 'kv4.brakes.master-late', seller: 0, condition: 'used_original', grade: 'ready', rubber: 'display_only', state: 'approved', qty: 1, cents: 9500, marks: true, description: `Clean and complete. ${RUBBER_OLD}` },
  { part: 'kv4.brakes.master-late', seller: 1, condition: 'rebuilt', rubber: 'serviceable', state: 'approved', qty: 2, cents: 17500, description: REBUILT },
  { part: 'kv4.brakes.master-late', seller: 0, condition: 'nos', rubber: 'display_only', state: 'submitted', qty: 1, cents: 59000, marks: true, title: 'Master cylinder, late, NOS, collector grade', description: `Unopened. ${RUBBER_OLD}` },
  { part: 'kv4.brakes.mc-kit', seller: 0, condition: 'nos', rubber: 'serviceable', state: 'submitted', qty: 4, cents: 3900, title: 'Master cylinder repair kit, NOS sealed packet', description: 'Sealed original packets, ready to fit.' },
  { part: 'kv4.brakes.mc-kit', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 12, cents: 3400, photo: 'kit', description: 'Complete kit: cups, piston, spring, check valve and boot. New rubber.' },
  { part: 'kv4.brakes.mc-kit', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'submitted', qty: 8, cents: 3300, title: 'Master cylinder repair kit, reproduction, second batch', description: 'Same kit from our new batch.' },
  { part: 'kv4.brakes.mc-boot', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 20, cents: 650 },
  { part: 'kv4.brakes.mc-boot', seller: 0, condition: 'nos', rubber: 'display_only', state: 'approved', qty: 2, cents: 900, description: RUBBER_OLD },
  { part: 'kv4.brakes.mc-cup-primary', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 30, cents: 300 },
  { part: 'kv4.brakes.mc-piston', seller: 0, condition: 'used_original', grade: 'honest', state: 'approved', qty: 2, cents: 1200 },
  { part: 'kv4.brakes.mc-piston', seller: 1, condition: 'reproduction', state: 'sold_out', qty: 0, cents: 1400 },
  { part: 'kv4.brakes.mc-spring', seller: 0, condition: 'nos', state: 'approved', qty: 5, cents: 450 },
  { part: 'kv4.brakes.mc-check-valve', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 15, cents: 500 },
  { part: 'kv4.brakes.mc-cap', seller: 0, condition: 'used_original', grade: 'weathered', state: 'approved', qty: 4, cents: 800, photo: 'cap', marks: true },
  { part: 'kv4.brakes.mc-cap-gasket', seller: 1, condition: 'reproduction', state: 'approved', qty: 40, cents: 150 },
  { part: 'kv4.brakes.mc-outlet', seller: 0, condition: 'nos', state: 'approved', qty: 3, cents: 1500 },
  { part: 'kv4.brakes.mc-outlet-washer', seller: 0, condition: 'nos', state: 'approved', qty: 100, cents: 60, description: 'Fit new whenever the fitting is disturbed.' },
  { part: 'kv4.brakes.mc-stop-ring', seller: 0, condition: 'nos', state: 'approved', qty: 10, cents: 150 },
  { part: 'kv4.brakes.stop-switch', seller: 0, condition: 'used_original', grade: 'honest', state: 'approved', qty: 2, cents: 1800 },
  { part: 'st25.brakes.master-early', seller: 0, condition: 'used_original', grade: 'hard_used', rubber: 'display_only', state: 'approved', qty: 1, cents: 3500, description: `Pitted bore; a pattern or a rebuild. ${RUBBER_OLD}` },
  { part: 'st25.brakes.master-early', seller: 1, condition: 'rebuilt', rubber: 'serviceable', state: 'draft', qty: 1, cents: 19000, description: REBUILT },
  { part: 'st25.brakes.master-late', seller: 1, condition: 'rebuilt', rubber: 'serviceable', state: 'approved', qty: 2, cents: 19900, photo: 'cylinder', description: REBUILT },
  { part: 'st25.brakes.master-late', seller: 0, condition: 'nos', rubber: 'display_only', state: 'approved', qty: 1, cents: 24000, marks: true, description: RUBBER_OLD },
  { part: 'st25.brakes.mc-kit', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 10, cents: 3600 },
  { part: 'kv4.brakes.hose-front', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 16, cents: 2400, photo: 'hose', description: 'New hose to the late pattern; replaces both early front hoses.' },
  { part: 'kv4.brakes.hose-front', seller: 0, condition: 'nos', rubber: 'display_only', state: 'approved', qty: 2, cents: 1800, description: RUBBER_OLD },
  { part: 'kv4.brakes.hose-front-left-early', seller: 0, condition: 'used_original', grade: 'donor', rubber: 'display_only', state: 'approved', qty: 1, cents: 500, description: `For its end fittings and tag only. ${RUBBER_OLD}` },
  { part: 'kv4.brakes.hose-rear', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 8, cents: 2600 },
  { part: 'kv4.brakes.wheel-cyl-front-late', seller: 1, condition: 'rebuilt', rubber: 'serviceable', state: 'approved', qty: 4, cents: 7800, description: REBUILT },
  { part: 'kv4.brakes.wheel-cyl-front-early', seller: 0, condition: 'core', rubber: 'display_only', state: 'approved', qty: 3, cents: 1500 },
  { part: 'kv4.brakes.wc-kit-front', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 25, cents: 1100 },
  { part: 'kv4.brakes.wc-kit-rear', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'submitted', qty: 20, cents: 1150 },
  { part: 'kv4.brakes.wheel-cyl-rear-late', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 6, cents: 5200 },
  { part: 'kv4.brakes.wc-boot-rear', seller: 1, condition: 'reproduction', rubber: 'serviceable', state: 'approved', qty: 50, cents: 200 },
  { part: 'kv4.brakes.shoe', seller: 0, condition: 'used_original', grade: 'honest', state: 'approved', qty: 4, cents: 2200 },
  { part: 'kv4.brakes.shoe-c1', seller: 0, condition: 'used_original', grade: 'hard_used', state: 'withdrawn', qty: 2, cents: 900 },
  { part: 'kv4.brakes.lining', seller: 1, condition: 'reproduction', state: 'approved', qty: 8, cents: 1600 },
  { part: 'kv4.brakes.bleeder', seller: 0, condition: 'nos', state: 'approved', qty: 12, cents: 350 },
  { part: 'kv4.brakes.tee-front', seller: 0, condition: 'nos', state: 'approved', qty: 3, cents: 1400 },
  { part: 'kv4.brakes.tube-mc-front-tee', seller: 1, condition: 'reproduction', state: 'approved', qty: 6, cents: 1900, description: 'Bent to pattern, double flared both ends, tube nuts fitted.' },
  { part: 'kv4.brakes.pedal-late', seller: 0, condition: 'used_original', grade: 'honest', state: 'approved', qty: 1, cents: 4500, photo: 'pedal', marks: true },
  { part: 'kv4.brakes.pedal-early', seller: 0, condition: 'used_original', grade: 'honest', state: 'changes_requested', qty: 1, cents: 4200, message: "Please add a photo showing the maker's marks on the pedal arm." },
  { part: 'kv4.brakes.pedal-pad', seller: 1, condition: 'reproduction', state: 'approved', qty: 10, cents: 1200 },
  { part: 'kv4.brakes.plate-front-left', seller: 0, condition: 'used_original', grade: 'weathered', state: 'approved', qty: 1, cents: 5500, photo: 'plate' },
  { part: 'kv4.brakes.park-drum', seller: 0, condition: 'used_original', grade: 'weathered', state: 'approved', qty: 1, cents: 7500 },
  { part: 'kv4.brakes.park-band', seller: 0, condition: 'core', state: 'approved', qty: 2, cents: 1500 },
  { part: 'kv4.steering.gear.housing-steering-gear-late', seller: 0, condition: 'core', state: 'approved', qty: 1, cents: 6000 },
  { part: 'kv4.steering.gear.arm-pitman', seller: 0, condition: 'used_original', grade: 'ready', state: 'approved', qty: 1, cents: 5500, marks: true },
  { part: 'kv4.steering.column.wheel-steering', seller: 0, condition: 'used_original', grade: 'honest', state: 'approved', qty: 1, cents: 12500 },
  { part: 'kv4.steering.gear.seal-lever-shaft-oil', seller: 1, condition: 'nors', state: 'approved', qty: 6, cents: 700 },
  { part: 'hw.cotter-1-8-x-1', seller: 0, condition: 'nos', state: 'approved', qty: 200, cents: 25 },
  { part: 'hw.key-606', seller: 0, condition: 'nos', state: 'approved', qty: 40, cents: 90 },
  { part: 'hw.lw-3-8', seller: 0, condition: 'nos', state: 'approved', qty: 300, cents: 15 },
  { part: 'hw.castle-3-8-24', seller: 0, condition: 'nos', state: 'approved', qty: 60, cents: 60 },
  { part: 'hw.hclamp-1-1-4', seller: 1, condition: 'reproduction', state: 'approved', qty: 80, cents: 180 },
  { part: 'kv4.accessories.display-mount.mount-pedestal-display-item-deactivated', seller: 0, condition: 'used_original', grade: 'honest', state: 'submitted', qty: 1, cents: 32000, description: 'Pedestal display mount only; nothing live, no regulated parts.' },
  { part: null, seller: 0, condition: 'nos', state: 'submitted', qty: 1, cents: 4500, title: 'Brass instruction plate, brake bleeding (unidentified)', description: 'Brass plate 90 x 40 mm, four corner holes, stamped "BLEED AT WHEELS IN ORDER RR LR RF LF". Came with a box of brake parts; not found in the catalog.' },
  { part: null, seller: 0, condition: 'used_original', grade: 'weathered', state: 'draft', qty: 1, cents: 2500, title: 'Cast bracket with two studs (unidentified)', description: 'Cast iron bracket, 140 mm long, two 3/8 in studs, casting mark "K7" and a diamond. Possibly from the brake linkage.' },
];

const COLOURS = ['#6d5a3a', '#4c5b3c', '#7a4b2a', '#3f4f5a', '#5b4a5e', '#6a6a48', '#80552f', '#44603f'];

/** A simple drawn "photo" of the kind of part, with a fictional demo caption; every index gets its own layout. */
function demoSvg(kind: Drawing, i: number): string {
  const bg = COLOURS[i % COLOURS.length];
  const shift = (i * 37) % 120;
  const shapes: Record<Drawing, string> = {
    cylinder: `<rect x="${180 + shift}" y="200" width="420" height="170" rx="30" fill="#9aa0a6"/><rect x="${120 + shift}" y="240" width="70" height="90" fill="#7d8288"/><circle cx="${520 + shift}" cy="190" r="50" fill="#b5b9bd"/><rect x="${600 + shift}" y="260" width="80" height="50" fill="#6f7479"/>`,
    kit: `<rect x="${140 + shift}" y="150" width="520" height="300" rx="12" fill="#e6dcc3"/><circle cx="${300 + shift}" cy="300" r="60" fill="#2d2d2d"/><circle cx="${470 + shift}" cy="300" r="40" fill="#2d2d2d"/><rect x="${540 + shift}" y="260" width="80" height="20" fill="#8a8a8a"/>`,
    hose: `<path d="M ${100 + shift} 420 C 300 100, 500 500, ${700 - shift} 180" stroke="#1f1f1f" stroke-width="38" fill="none"/><rect x="${80 + shift}" y="400" width="60" height="40" fill="#b08d57"/><rect x="${680 - shift}" y="160" width="60" height="40" fill="#b08d57"/>`,
    cap: `<circle cx="${400 + shift / 2}" cy="300" r="140" fill="#8c8f93"/><circle cx="${400 + shift / 2}" cy="300" r="60" fill="#5c5f63"/><rect x="${380 + shift / 2}" y="120" width="40" height="60" fill="#6c6f73"/>`,
    pedal: `<rect x="${360 + shift}" y="80" width="40" height="360" fill="#4d5a3f" transform="rotate(-15 380 260)"/><rect x="${260 + shift}" y="420" width="200" height="60" rx="10" fill="#2a2a2a"/><circle cx="${420 + shift}" cy="100" r="30" fill="#777"/>`,
    plate: `<circle cx="${400 + shift / 3}" cy="300" r="210" fill="#5a5f55"/><circle cx="${400 + shift / 3}" cy="300" r="70" fill="#3a3d37"/><circle cx="${300 + shift / 3}" cy="200" r="14" fill="#222"/><circle cx="${500 + shift / 3}" cy="400" r="14" fill="#222"/>`,
  };
  return `<svg xmlns="http://www.w3.org/2000/svg" width="960" height="600" viewBox="0 0 800 600">
<defs><linearGradient id="g" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="${bg}"/><stop offset="1" stop-color="#d8cfbd"/></linearGradient></defs>
<rect width="800" height="600" fill="url(#g)"/>
<rect x="0" y="480" width="800" height="120" fill="#c9bda2"/>
${shapes[kind]}
<text x="24" y="570" font-family="sans-serif" font-size="26" fill="#2a2620">DEMO PHOTO · fictional listing ${i + 1}</text>
</svg>`;
}

export async function seedListings(db: Db) {
  const sellerRows = await db.select({ id: users.id, email: users.email }).from(users).where(inArray(users.email, [...SELLERS]));
  const sellerIds = SELLERS.map((e) => sellerRows.find((r) => r.email === e)?.id);
  if (sellerIds.some((x) => !x)) throw new Error('seedListings: seed the demo accounts first (seller@ and seller2@drabyard.test)');
  const sellers = sellerIds as [string, string];

  for (const [i, shop] of SHOPS.entries()) {
    await db.insert(sellerProfiles).values({ userId: sellers[i], ...shop }).onConflictDoNothing();
  }
  const profileIds: string[] = [];
  for (const [i, p] of SHIPPING.entries()) {
    const id = demoId(`shipping:${i}`);
    await db
      .insert(shippingProfiles)
      .values({ id, sellerId: sellers[i], name: p.name, rules: shippingProfileSchema.parse(p.rules), isDefault: true })
      .onConflictDoNothing();
    profileIds.push(id);
  }

  const keys = [...new Set(SPECS.map((s) => s.part).filter((k): k is string => k !== null))];
  const partRows = await db.select().from(parts).where(and(isNotNull(parts.seedKey), inArray(parts.seedKey, keys)));
  const partByKey = new Map(partRows.map((p) => [p.seedKey!, p]));
  const missing = keys.filter((k) => !partByKey.has(k));

  let inserted = 0;
  let photos = 0;
  const storage = getPhotoStorage();
  const base = new Date('2026-02-02T10:00:00Z').getTime();
  for (const [i, s] of SPECS.entries()) {
    const part = s.part ? partByKey.get(s.part) : null;
    if (s.part && !part) continue;
    const id = demoId(`listing:${i}`);
    const day = 86_400_000;
    const created = new Date(base + i * day * 0.6);
    const submitted = s.state === 'draft' ? null : new Date(created.getTime() + day / 4);
    const approved = ['approved', 'sold_out', 'withdrawn'].includes(s.state) ? new Date(created.getTime() + day / 2) : null;
    const description = s.description ?? '';
    const [row] = await db
      .insert(listings)
      .values({
        id,
        sellerId: sellers[s.seller],
        partId: part?.id ?? null,
        title: s.title ?? `${part?.name ?? 'Unidentified part'} (${s.condition.replace('_', ' ')})`,
        condition: s.condition,
        usedGrade: s.grade ?? null,
        rubberUse: s.rubber ?? null,
        makersMarks: s.marks ?? false,
        quantity: s.qty,
        priceCents: s.cents,
        weightGrams: part?.weightGrams ?? 250,
        lengthMm: part?.lengthMm ?? 150,
        widthMm: part?.widthMm ?? 60,
        heightMm: part?.heightMm ?? 20,
        shippingProfileId: profileIds[s.seller],
        descriptionMd: description,
        descriptionHtml: renderDescription(description, 'plain'),
        state: s.state,
        submittedAt: submitted,
        approvedAt: approved,
        createdAt: created,
      })
      .onConflictDoNothing()
      .returning();
    if (!row) continue;
    inserted++;
    await db.insert(listingEvents).values({ listingId: id, actorId: null, action: 'demo_seed', fromState: null, toState: s.state, message: s.message ?? null, at: created });

    if (s.photo) {
      const result = await processUpload(await sharp(Buffer.from(demoSvg(s.photo, i))).jpeg({ quality: 88 }).toBuffer());
      if (!result.ok) throw new Error(`seedListings: demo photo ${i} was refused: ${result.message}`);
      const photoId = demoId(`photo:${i}`);
      const k = Object.fromEntries(photoSizeNames.map((n) => [n, photoKey(id, photoId, n)])) as Record<(typeof photoSizeNames)[number], string>;
      for (const n of photoSizeNames) await storage.put(k[n], result.photo.sizes[n].buffer, 'image/webp');
      await db
        .insert(listingPhotos)
        .values({
          id: photoId,
          listingId: id,
          position: 0,
          thumbKey: k.thumb,
          mediumKey: k.medium,
          largeKey: k.large,
          width: result.photo.sizes.large.width,
          height: result.photo.sizes.large.height,
          placeholderColor: result.photo.placeholderColor,
          dhash: result.photo.dhash,
        })
        .onConflictDoNothing();
      photos++;
    }
  }
  // Flags of the listings waiting in review, judged against the approved ones above.
  const waiting = await db.select().from(listings).where(and(eq(listings.state, 'submitted'), inArray(listings.sellerId, sellers)));
  for (const l of waiting) await refreshFlags(db, l);
  return { listings: inserted, photos, missingParts: missing.length };
}
