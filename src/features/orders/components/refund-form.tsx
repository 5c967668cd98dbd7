import { Undo2 } from 'lucide-react';
import { useId, useState, type FormEvent } from 'react';
import { toast } from 'sonner';
import { refundInput, type OrderDto, type RefundInput, type SubOrderDto } from '@shared/schemas/orders';
import { Button } from '@/components/ui/button';
import { TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { useRefundOrder } from '../api/refund-order';
import { dollarsToCents, formatCents } from '../utils/money';

/** What is left to refund on one seller's part (server/services/orders.ts remainingOf). */
export const refundableCents = (s: SubOrderDto) => s.itemsCents + s.shippingCents - s.refundedCents;

/** Only a paid order with money left on this part can be refunded (server/services/orders.ts refundOrder). */
export const canRefund = (order: OrderDto, s: SubOrderDto) => (order.state === 'paid' || order.state === 'partially_refunded') && refundableCents(s) > 0;

/** The administrator's refund of one sub-order: an amount, the whole remainder, or every unit back into stock. */
export function RefundForm({ order, subOrder }: { order: OrderDto; subOrder: SubOrderDto }) {
  const refund = useRefundOrder();
  const [amount, setAmount] = useState('');
  const [restock, setRestock] = useState(false);
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const restockId = useId();
  const left = refundableCents(subOrder);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setError(null);
    let input: RefundInput;
    if (restock) {
      // The server restocks only named lines, so name every unit not yet refunded.
      const lines = subOrder.lines.filter((l) => l.quantity > l.refundedQuantity).map((l) => ({ lineId: l.id, quantity: l.quantity - l.refundedQuantity }));
      if (!lines.length) return setError('Every unit of this part is refunded already; nothing can go back into stock.');
      input = { subOrderId: subOrder.id, lines, restock: true, reason };
    } else if (amount.trim() !== '') {
      const cents = dollarsToCents(amount);
      if (cents === null || cents === 0) return setError('Type an amount in dollars, such as 12.50, or leave it empty for the whole part.');
      if (cents > left) return setError(`At most ${formatCents(left)} is left to refund on this part.`);
      input = { subOrderId: subOrder.id, amountCents: cents, restock: false, reason };
    } else {
      input = { subOrderId: subOrder.id, restock: false, reason };
    }
    const checked = refundInput.safeParse(input);
    if (!checked.success) return setError(checked.error.issues[0]?.message ?? 'The refund is not complete.');
    refund.mutate(
      { orderId: order.id, ...checked.data },
      {
        onSuccess: () => {
          toast.success(`Refunded on the part from ${subOrder.seller.name}`);
          setAmount('');
          setReason('');
          setRestock(false);
        },
      },
    );
  };

  return (
    <form noValidate aria-label={`Refund the part from ${subOrder.seller.name}`} onSubmit={submit} className="space-y-3 border-t border-rule pt-3">
      <h4 className="text-sm font-semibold text-ink">Refund (admin) · {formatCents(left)} left</h4>
      <TextField
        label="Amount in dollars"
        inputMode="decimal"
        hint={restock ? 'Putting items back refunds every remaining unit at its price.' : 'Leave empty to refund the whole part, shipping included.'}
        value={restock ? '' : amount}
        disabled={restock}
        onChange={(e) => setAmount(e.target.value)}
      />
      <div className="flex items-center gap-2 text-sm">
        <input id={restockId} type="checkbox" checked={restock} onChange={(e) => setRestock(e.target.checked)} className="size-4 accent-patina-600" />
        <label htmlFor={restockId}>Put the items back in stock</label>
      </div>
      <TextAreaField label="Reason" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} required />
      <FormAlert message={error ?? refund.error?.message} />
      <Button type="submit" size="sm" variant="danger" icon={<Undo2 aria-hidden="true" className="size-4" />} isLoading={refund.isPending}>
        Refund
      </Button>
    </form>
  );
}
