/** A short, readable reference for an order id (the full id stays in the URL). */
export function orderRef(id: string): string {
  return id.replaceAll('-', '').slice(0, 8).toUpperCase();
}
