import { eq } from 'drizzle-orm';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { carts, listings } from '../../server/db/schema/index';
import { addToCart, buyer, createLiveListing, createShippingProfile, createShop } from '../factories/orders';
import { createUser, ORIGIN } from '../factories/users';

const app = createApp();

describe('cart', () => {
  it('when a visitor adds to the cart without signing in, then a cookie cart holds it and sign-in merges it, capped by stock', async () => {
    const shop = await createShop({});
    const a = await createLiveListing(shop.user.id, { quantity: 3, priceCents: 1000 });
    const b = await createLiveListing(shop.user.id, { quantity: 5, priceCents: 2000 });
    const user = await createUser({ roles: ['buyer'] });
    const signedIn = request.agent(app);
    await signedIn.post('/api/auth/login').set('Origin', ORIGIN).send({ email: user.email, password: user.password });
    await addToCart(signedIn, a.id, 2);
    await signedIn.post('/api/auth/logout').set('Origin', ORIGIN).send({});

    const visitor = request.agent(app);
    const added = await visitor.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: a.id, quantity: 2 });
    expect(added.status).toBe(201);
    expect(String(added.headers['set-cookie'])).toMatch(/drabyard\.cart=/);
    await addToCart(visitor, b.id, 1);
    expect((await visitor.get('/api/cart')).body.groups[0].items).toHaveLength(2);

    const login = await visitor.post('/api/auth/login').set('Origin', ORIGIN).send({ email: user.email, password: user.password });
    expect(login.status).toBe(200);
    const cart = await visitor.get('/api/cart');
    const byId = Object.fromEntries(cart.body.groups[0].items.map((i: { listingId: string; quantity: number }) => [i.listingId, i.quantity]));
    expect(byId).toEqual({ [a.id]: 3, [b.id]: 1 }); // 2 + 2 capped at the 3 in stock
    expect(await getDb().select().from(carts).where(eq(carts.userId, user.id))).toHaveLength(1);
  });

  it('when items of two sellers are in the cart, then each seller is a group with its own shipping and the totals add up in cents', async () => {
    const flat = await createShop({ shopName: 'Fictional Flat Rate Depot', profile: { kind: 'flat_per_order', amountCents: 1500, shipsTo: ['US'], freeAboveCents: 10_000 } });
    const bands = await createShop({
      shopName: 'Fictional Heavy Iron',
      profile: { kind: 'weight_bands', bands: [{ upToGrams: 2000, amountCents: 900 }, { upToGrams: 10_000, amountCents: 2400 }], shipsTo: ['US', 'CA'], pickupAvailable: true },
    });
    const cheap = await createLiveListing(flat.user.id, { priceCents: 3000, quantity: 9 });
    // 304 x 304 x 254 mm rounds up to a 12 x 12 x 10 in box of 1 kg: dimensional 1440 / 139 -> 11 lb = 4990 g, so the second band applies
    const bulky = await createLiveListing(bands.user.id, { priceCents: 4500, weightGrams: 1000, lengthMm: 304, widthMm: 304, heightMm: 254 });
    const { agent } = await buyer(app);
    await addToCart(agent, cheap.id, 2);
    await addToCart(agent, bulky.id, 1);

    const us = (await agent.get('/api/cart').query({ country: 'US' })).body;
    expect(us.groups.map((g: { seller: { name: string } }) => g.seller.name)).toEqual(['Fictional Flat Rate Depot', 'Fictional Heavy Iron']);
    expect(us.groups[0]).toMatchObject({ itemsCents: 6000, shipping: { ok: true, amountCents: 1500, explanation: 'Flat rate per order: 15.00.' } });
    expect(us.groups[1]).toMatchObject({ itemsCents: 4500, shipping: { ok: true, amountCents: 2400 } });
    expect(us.groups[1].shipping.explanation).toContain('4990 g');
    expect(us).toMatchObject({ itemsCents: 10_500, shippingCents: 3900, totalCents: 14_400, canCheckout: true, destination: { country: 'US' } });

    await agent.patch(`/api/cart/items/${cheap.id}`).set('Origin', ORIGIN).send({ quantity: 4 });
    const free = (await agent.get('/api/cart').query({ country: 'US' })).body;
    expect(free.groups[0].shipping).toMatchObject({ ok: true, amountCents: 0 });
    expect(free.groups[0].shipping.explanation).toMatch(/^Free shipping/);

    const ca = (await agent.get('/api/cart').query({ country: 'ca' })).body;
    expect(ca.groups[0].shipping).toEqual({ ok: false, reason: 'does_not_ship_to', explanation: 'This seller does not ship to CA.' });
    expect(ca.canCheckout).toBe(false);
    expect(ca.warnings).toContainEqual(expect.objectContaining({ code: 'shipping_unavailable', sellerId: flat.user.id }));

    const pickup = (await agent.get('/api/cart').query({ pickup: '1' })).body;
    expect(pickup.groups[0].shipping.reason).toBe('pickup_not_offered');
    expect(pickup.groups[1].shipping).toMatchObject({ ok: true, amountCents: 0 });

    const none = (await agent.get('/api/cart')).body;
    expect(none.groups[0].shipping.reason).toBe('destination_needed');
    expect(none).toMatchObject({ shippingCents: 0, canCheckout: false, destination: null });
  });

  it('when a listing uses its own profile and the shop ships only to some countries, then both rules count', async () => {
    const shop = await createShop({ shipsTo: ['US'], profile: { kind: 'flat_per_order', amountCents: 500, shipsTo: ['*'] } });
    const perItem = await createShippingProfile(shop.user.id, { kind: 'per_item', firstItemCents: 700, additionalItemCents: 200, shipsTo: ['*'] });
    const a = await createLiveListing(shop.user.id, { priceCents: 1000 });
    const b = await createLiveListing(shop.user.id, { priceCents: 1000, shippingProfileId: perItem.id });
    const { agent } = await buyer(app);
    await addToCart(agent, a.id, 1);
    await addToCart(agent, b.id, 3);
    const us = (await agent.get('/api/cart').query({ country: 'US' })).body;
    expect(us.groups[0].shipping).toMatchObject({ ok: true, amountCents: 500 + 700 + 2 * 200 });
    const de = (await agent.get('/api/cart').query({ country: 'DE' })).body;
    expect(de.groups[0].shipping).toMatchObject({ ok: false, reason: 'does_not_ship_to' });
  });

  it('when more is asked than is in stock, then the quantity is capped with a warning; a sold-out listing is refused', async () => {
    const shop = await createShop({});
    const l = await createLiveListing(shop.user.id, { quantity: 2 });
    const { agent } = await buyer(app);
    const r = await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: l.id, quantity: 5 });
    expect(r.status).toBe(201);
    expect(r.body.groups[0].items[0]).toMatchObject({ quantity: 2, available: 2 });
    expect(r.body.warnings).toContainEqual(expect.objectContaining({ code: 'quantity_capped', listingId: l.id }));
    const p = await agent.patch(`/api/cart/items/${l.id}`).set('Origin', ORIGIN).send({ quantity: 9 });
    expect(p.body.groups[0].items[0].quantity).toBe(2);

    // stock falls after adding: the cart shows it and cannot check out
    await getDb().update(listings).set({ quantity: 1 }).where(eq(listings.id, l.id));
    const view = (await agent.get('/api/cart').query({ country: 'US' })).body;
    expect(view.groups[0].items[0]).toMatchObject({ quantity: 2, available: 1 });
    expect(view.canCheckout).toBe(false);

    const gone = await createLiveListing(shop.user.id, { quantity: 0 });
    const refused = await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: gone.id, quantity: 1 });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/sold out/);
  });

  it('when the price changes after adding, then the cart shows both prices and says so', async () => {
    const shop = await createShop({});
    const l = await createLiveListing(shop.user.id, { priceCents: 2500 });
    const { agent } = await buyer(app);
    await addToCart(agent, l.id, 2);
    await getDb().update(listings).set({ priceCents: 2750 }).where(eq(listings.id, l.id));
    const body = (await agent.get('/api/cart')).body;
    expect(body.groups[0].items[0]).toMatchObject({ unitPriceCents: 2750, priceCentsAtAdd: 2500, priceChanged: true, lineCents: 5500 });
    expect(body.warnings).toContainEqual(expect.objectContaining({ code: 'price_changed', message: expect.stringContaining('$27.50') }));
  });

  it('when lines are removed, own listings added or input is bad, then the answers are clear', async () => {
    const shop = await createShop({});
    const l = await createLiveListing(shop.user.id, {});
    const { agent } = await buyer(app);
    await addToCart(agent, l.id, 1);
    const del = await agent.delete(`/api/cart/items/${l.id}`).set('Origin', ORIGIN);
    expect(del.status).toBe(200);
    expect(del.body.groups).toEqual([]);
    expect((await agent.delete(`/api/cart/items/${l.id}`).set('Origin', ORIGIN)).status).toBe(404);
    expect((await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: l.id, quantity: 0 })).status).toBe(400);
    expect((await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: 'nope' })).status).toBe(400);
    expect((await agent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: '00000000-0000-4000-8000-000000000000' })).status).toBe(404);
    expect((await agent.post('/api/cart/items').send({ listingId: l.id })).status).toBe(403); // no Origin

    const sellerAgent = request.agent(app);
    await sellerAgent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: shop.user.email, password: shop.user.password });
    const own = await sellerAgent.post('/api/cart/items').set('Origin', ORIGIN).send({ listingId: l.id });
    expect(own.status).toBe(409);
  });
});
