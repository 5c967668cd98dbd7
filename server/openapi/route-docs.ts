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
];
