import { z } from 'zod';
import { forgotPasswordInput, loginInput, registerInput, resetPasswordInput, sellerApplicationDecisionInput, sellerApplicationInput, verifyEmailInput } from '../../shared/schemas/auth';
import {
  assemblyQuery,
  createAssemblyInput,
  createLineInput,
  createPartInput,
  createSupersessionInput,
  partNumberInput,
  resolveQuery,
  updateAssemblyInput,
  updateLineInput,
  updatePartInput,
} from '../../shared/schemas/catalog';
import {
  adminListingsQuery, bulkApproveInput, createListingInput, importCommitInput, importPreviewInput, linkPartInput,
  listingDecisionInput, myListingsQuery, photoOrderInput, publicListingsQuery, shippingProfileInput, shopProfileInput,
  updateListingInput, updateShippingProfileInput,
} from '../../shared/schemas/listings';

import { addCartItemInput, cartQuery, checkoutInput, refundInput, sellerOrdersQuery, shipInput, statementQuery, updateCartItemInput } from '../../shared/schemas/orders';
import { searchQuery, suggestQuery } from '../../shared/schemas/search';
import { garageRouteDocs } from '../routes/garage';

export interface RouteDoc {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Express-style path, e.g. /api/parts/:id */
  path: string;
  summary: string;
  body?: z.ZodType;
  query?: z.ZodObject;
  /** Content type of the body when it is not JSON (uploads, webhooks). */
  bodyType?: 'multipart/form-data' | 'text/csv' | 'application/octet-stream';
  responses?: Record<number, string>;
}

/**
 * One entry per API route. Adding a route without an entry here fails tests/integration/openapi.test.ts.
 * Request schemas are the same zod schemas the routes parse with.
 */
export const routeDocs: RouteDoc[] = [
  { method: 'GET', path: '/api/health', summary: 'Liveness and database reachability: {ok, db}', responses: { 200: 'Up', 503: 'Database down' } },
  { method: 'POST', path: '/api/auth/register', summary: 'Create an account; sends a verification mail', body: registerInput, responses: { 201: '{user}', 400: 'Validation failed', 409: 'E-mail taken' } },
  { method: 'POST', path: '/api/auth/login', summary: 'Sign in with e-mail and password', body: loginInput, responses: { 200: '{user}', 401: 'Wrong e-mail or password', 429: 'Throttled after repeated failures' } },
  { method: 'POST', path: '/api/auth/logout', summary: 'Sign out', responses: { 204: 'Signed out' } },
  { method: 'GET', path: '/api/auth/me', summary: 'The signed-in user', responses: { 200: '{user}', 401: 'Not signed in' } },
  { method: 'POST', path: '/api/auth/verify-email', summary: 'Confirm an e-mail address with the mailed token (single use)', body: verifyEmailInput },
  { method: 'POST', path: '/api/auth/resend-verification', summary: 'Send the verification mail again', responses: { 204: 'Sent' } },
  { method: 'POST', path: '/api/auth/forgot-password', summary: 'Mail a password-reset link (same reply whether or not the account exists)', body: forgotPasswordInput, responses: { 202: 'Accepted' } },
  { method: 'POST', path: '/api/auth/reset-password', summary: 'Set a new password with the mailed token (single use, one hour)', body: resetPasswordInput },
  { method: 'POST', path: '/api/seller-applications', summary: 'Apply to sell', body: sellerApplicationInput, responses: { 201: '{application}', 409: 'Already pending or already a seller' } },
  { method: 'GET', path: '/api/seller-applications/mine', summary: "The caller's latest seller application" },
  { method: 'GET', path: '/api/admin/seller-applications', summary: 'Seller applications (admin)', query: z.object({ state: z.enum(['pending', 'approved', 'rejected']).optional() }) },
  { method: 'POST', path: '/api/admin/seller-applications/:id/decision', summary: 'Approve (grants the seller role) or reject an application (admin)', body: sellerApplicationDecisionInput },
  { method: 'GET', path: '/api/vehicles', summary: 'Vehicle models' },
  { method: 'GET', path: '/api/vehicles/:slug', summary: 'A vehicle model with variants, systems and the assembly tree' },
  { method: 'GET', path: '/api/assemblies/:id', summary: 'An assembly: diagram, callouts and bill of materials with applicability applied for a vehicle', query: assemblyQuery },
  { method: 'GET', path: '/api/parts/resolve', summary: 'Resolve a part number in any shape: matches, chain, current parts, fillers, problems', query: resolveQuery },
  { method: 'GET', path: '/api/parts/:id', summary: 'A part: numbers by kind, specifications with standards, chain, cautions, live listings' },
  { method: 'POST', path: '/api/admin/parts', summary: 'Create a part with its numbers (admin, audited)', body: createPartInput },
  { method: 'PATCH', path: '/api/admin/parts/:id', summary: 'Change a part (admin, audited)', body: updatePartInput },
  { method: 'DELETE', path: '/api/admin/parts/:id', summary: 'Delete a part that no line uses (admin, audited)' },
  { method: 'POST', path: '/api/admin/parts/:id/numbers', summary: 'Add a number to a part (admin, audited)', body: partNumberInput },
  { method: 'DELETE', path: '/api/admin/parts/:id/numbers/:numberId', summary: 'Remove a number from a part (admin, audited)' },
  { method: 'POST', path: '/api/admin/supersessions', summary: 'Record that one part is replaced by another (admin, audited)', body: createSupersessionInput },
  { method: 'DELETE', path: '/api/admin/supersessions/:id', summary: 'Delete a supersession (admin, audited)' },
  { method: 'POST', path: '/api/admin/assemblies', summary: 'Create an assembly (admin, audited)', body: createAssemblyInput },
  { method: 'PATCH', path: '/api/admin/assemblies/:id', summary: 'Change an assembly (admin, audited)', body: updateAssemblyInput },
  { method: 'DELETE', path: '/api/admin/assemblies/:id', summary: 'Delete an assembly (admin, audited)' },
  { method: 'POST', path: '/api/admin/lines', summary: 'Add a bill-of-materials line (admin, audited)', body: createLineInput },
  { method: 'PATCH', path: '/api/admin/lines/:id', summary: 'Change a bill-of-materials line (admin, audited)', body: updateLineInput },
  { method: 'DELETE', path: '/api/admin/lines/:id', summary: 'Delete a bill-of-materials line (admin, audited)' },
  { method: 'GET', path: '/api/admin/data-quality', summary: 'Catalog data-quality report (admin)' },
  { method: 'GET', path: '/api/listings', summary: 'Live listings of catalog parts (?partId=a,b), cheapest first: {listings}', query: publicListingsQuery },
  { method: 'GET', path: '/api/listings/:id', summary: 'Listing page: listing, condition explained, seller card, part with chain, cautions, shipping; private states for the seller and admins only', responses: { 200: '{listing, condition, seller, part, cautions, shipping, viewer, events?}', 404: 'Not found or not visible' } },
  { method: 'POST', path: '/api/listings', summary: 'Create a draft listing (seller, audited)', body: createListingInput, responses: { 201: '{listing}', 400: 'Validation failed' } },
  { method: 'PATCH', path: '/api/listings/:id', summary: 'Edit an own listing; part, condition, title or photos send a live listing back to review', body: updateListingInput, responses: { 200: '{listing}', 403: 'Another seller\'s live listing', 404: 'Not found', 409: 'Not editable in this state' } },
  { method: 'DELETE', path: '/api/listings/:id', summary: 'Delete an own draft that was never submitted', responses: { 204: 'Deleted', 409: 'Not a fresh draft' } },
  { method: 'POST', path: '/api/listings/:id/submit', summary: 'Submit for review; automatic flags are computed', responses: { 200: '{listing} with flags', 409: 'Wrong state' } },
  { method: 'POST', path: '/api/listings/:id/withdraw', summary: 'Withdraw an own listing', responses: { 200: '{listing}' } },
  { method: 'POST', path: '/api/listings/:id/reopen', summary: 'Reopen a withdrawn listing as a draft', responses: { 200: '{listing}' } },
  { method: 'POST', path: '/api/listings/:id/photos', summary: 'Add photos (field "photos", at most 12 files of 15 MB; all or nothing)', bodyType: 'multipart/form-data', responses: { 201: '{listing, photos}', 400: 'Corrupt image, too many files or wrong field', 413: 'File or image too large', 415: 'Not a JPEG, PNG or WebP' } },
  { method: 'PUT', path: '/api/listings/:id/photos/order', summary: 'Set the order of a listing\'s photos', body: photoOrderInput, responses: { 200: '{photos}' } },
  { method: 'DELETE', path: '/api/listings/:id/photos/:photoId', summary: 'Remove a photo (a live listing goes back to review)', responses: { 200: '{listing}' } },
  { method: 'GET', path: '/api/me/listings', summary: 'Seller dashboard: own listings (filter, sort, page) and counts by state', query: myListingsQuery, responses: { 200: '{listings, counts, total, page, pageSize}' } },
  { method: 'GET', path: '/api/me/listings/import/template', summary: 'CSV template for the bulk import', responses: { 200: 'text/csv' } },
  { method: 'POST', path: '/api/me/listings/import/preview', summary: 'Bulk import step 1-2: column mapping and per-row errors (JSON {csv, mapping} or multipart field "file")', body: importPreviewInput, responses: { 200: '{headers, mapping, fields, rows, summary}' } },
  { method: 'POST', path: '/api/me/listings/import', summary: 'Bulk import: create the rows as drafts or submitted, in one transaction', body: importCommitInput, responses: { 201: '{created, listingIds, as, skipped}', 400: 'Rows with errors (details.rows)' } },
  { method: 'GET', path: '/api/me/shop', summary: 'The seller\'s shop profile', responses: { 200: '{shop|null}' } },
  { method: 'PUT', path: '/api/me/shop', summary: 'Save the shop profile (audited)', body: shopProfileInput, responses: { 200: '{shop}' } },
  { method: 'GET', path: '/api/me/shipping-profiles', summary: 'The seller\'s shipping profiles', responses: { 200: '{profiles}' } },
  { method: 'POST', path: '/api/me/shipping-profiles', summary: 'Create a shipping profile (rules checked by the shipping domain schema)', body: shippingProfileInput, responses: { 201: '{profile}' } },
  { method: 'PATCH', path: '/api/me/shipping-profiles/:id', summary: 'Change a shipping profile', body: updateShippingProfileInput, responses: { 200: '{profile}' } },
  { method: 'DELETE', path: '/api/me/shipping-profiles/:id', summary: 'Delete a shipping profile', responses: { 204: 'Deleted' } },
  { method: 'GET', path: '/api/admin/listings', summary: 'Review queue (admin): filter by state, flag, seller and age', query: adminListingsQuery, responses: { 200: '{listings} with flags, seller, waitingHours' } },
  { method: 'POST', path: '/api/admin/listings/approve', summary: 'Approve many unflagged submitted listings (admin)', body: bulkApproveInput, responses: { 200: '{approved, skipped}' } },
  { method: 'POST', path: '/api/admin/listings/:id/decision', summary: 'Approve, request changes (message) or reject (reason); the seller is mailed (admin, audited)', body: listingDecisionInput, responses: { 200: '{listing}', 409: 'Wrong state or a blocking flag' } },
  { method: 'POST', path: '/api/admin/listings/:id/part', summary: 'Link a listing (e.g. an unidentified part) to a catalog part (admin, audited)', body: linkPartInput, responses: { 200: '{listing}' } },
  ...garageRouteDocs,
  { method: 'GET', path: '/api/search', summary: 'One query box over catalog parts and live listings: numbers in any shape (supersession-aware, with the fit note), words ranked by relevance, disjunctive facets, keyset pages', query: searchQuery, responses: { 200: '{total, totalIsEstimate, hits, facets, nextCursor, didYouMean}', 400: 'Unknown filter value or parameter, tampered cursor' } },
  { method: 'GET', path: '/api/search/suggest', summary: 'Up to 10 parts and numbers as the user types', query: suggestQuery },
  { method: 'GET', path: '/api/cart', summary: 'The cart (signed in, or the anonymous cookie cart): groups per seller, shipping quotes, totals in cents, warnings', query: cartQuery },
  { method: 'POST', path: '/api/cart/items', summary: 'Add units of a live listing, capped by stock (creates the anonymous cart cookie when signed out)', body: addCartItemInput, query: cartQuery, responses: { 201: 'The cart', 404: 'No such live listing', 409: 'Sold out or own listing' } },
  { method: 'PATCH', path: '/api/cart/items/:listingId', summary: 'Set the quantity of a cart line, capped by stock', body: updateCartItemInput, query: cartQuery, responses: { 200: 'The cart', 404: 'Not in the cart' } },
  { method: 'DELETE', path: '/api/cart/items/:listingId', summary: 'Remove a cart line', query: cartQuery, responses: { 200: 'The cart', 404: 'Not in the cart' } },
  { method: 'POST', path: '/api/checkout', summary: 'Reserve the stock of the whole cart and open one Stripe Checkout Session: {orderId, url}', body: checkoutInput, responses: { 201: '{orderId, url}', 400: 'Empty cart or below the card minimum', 401: 'Not signed in', 409: 'Out of stock (details.outOfStock) or shipping refused (details.shipping)', 503: 'Payment could not be started; stock released' } },
  { method: 'GET', path: '/api/orders', summary: "The buyer's orders, newest first" },
  { method: 'GET', path: '/api/orders/:id', summary: "One order with sub-orders per seller, lines and refunds (the buyer's own, or any for an admin)", responses: { 200: '{order}', 404: 'Not found or not yours' } },
  { method: 'POST', path: '/api/orders/:id/cancel', summary: 'Give up an unpaid checkout: the session is expired and the stock released', responses: { 200: '{order}', 409: 'Not an unpaid checkout' } },
  { method: 'GET', path: '/api/seller/orders', summary: "The seller's paid sub-orders (seller)", query: sellerOrdersQuery },
  { method: 'GET', path: '/api/seller/orders/:subOrderId', summary: 'One of the seller\'s sub-orders with buyer, destination, fee, share and transfer (seller)', responses: { 200: '{subOrder}', 404: 'Not found or not yours' } },
  { method: 'POST', path: '/api/seller/orders/:subOrderId/ship', summary: 'Mark shipped with carrier and tracking; mails the buyer (seller)', body: shipInput, responses: { 200: '{subOrder}', 409: 'Not paid, already shipped, or a pickup' } },
  { method: 'POST', path: '/api/seller/orders/:subOrderId/deliver', summary: 'Mark delivered (after shipping, or a pickup handed over) (seller)', responses: { 200: '{subOrder}', 409: 'Not shipped yet' } },
  { method: 'GET', path: '/api/seller/payouts', summary: 'Payout onboarding state and money in transfers, with recent transfers (seller)' },
  { method: 'POST', path: '/api/seller/payouts/onboarding', summary: "Create the seller's connected account if needed and return a fresh onboarding link: {url} (seller)", responses: { 200: '{url}', 409: 'No shop profile, or already onboarded' } },
  { method: 'GET', path: '/api/seller/statements', summary: 'Monthly payout statement (sales, shipping, fees, refunds, net); format=csv downloads it (seller)', query: statementQuery },
  { method: 'POST', path: '/api/admin/orders/:id/refund', summary: 'Refund a paid order in whole or part through Stripe, restocking when asked (admin, audited)', body: refundInput, responses: { 200: '{order}', 400: 'More than is left, or a foreign line', 409: 'Not refundable, or the processor refused' } },
  { method: 'POST', path: '/api/webhooks/stripe', summary: 'Stripe events, verified by the Stripe-Signature header on the raw body; each event id is processed once', bodyType: 'application/octet-stream', responses: { 200: '{received, duplicate, type}', 400: 'Bad or stale signature', 503: 'Not ready; Stripe retries' } },
];
