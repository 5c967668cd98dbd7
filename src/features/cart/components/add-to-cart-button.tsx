import { Check, ShoppingCart } from 'lucide-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { useAddCartItem } from '../api/add-cart-item';

type Props = {
  listingId: string;
  /** Units that can be bought now; 0 shows a disabled "Sold out". */
  available: number;
};

/**
 * "Add to cart" for the listing page. Works signed out too (the server keeps an anonymous cart behind a
 * cookie and merges it at sign-in). Adding again adds one more, up to the stock.
 */
export function AddToCartButton({ listingId, available }: Props) {
  const add = useAddCartItem();
  const [added, setAdded] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  if (available <= 0) {
    return (
      <Button disabled variant="secondary" className="w-full sm:w-auto">
        Sold out
      </Button>
    );
  }

  const onClick = () => {
    setProblem(null);
    add.mutate(
      { listingId, quantity: 1 },
      {
        onSuccess: (cart) => {
          setAdded(true);
          const capped = cart.warnings.find((w) => w.code === 'quantity_capped' && w.listingId === listingId);
          if (capped) toast.warning(capped.message);
          else toast.success('Added to your cart');
        },
        onError: (e) => setProblem(e.message),
      },
    );
  };

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={onClick} isLoading={add.isPending} icon={<ShoppingCart aria-hidden="true" className="size-4" />}>
          Add to cart
        </Button>
        {added ? (
          <span className="inline-flex items-center gap-1.5 text-sm text-ok">
            <Check aria-hidden="true" className="size-4" /> In your cart ·{' '}
            <Link to={paths.cart.getHref()} className={textLinkClasses}>
              View cart
            </Link>
          </span>
        ) : null}
      </div>
      {problem ? (
        <p role="alert" className="text-sm font-medium text-danger">
          {problem}
        </p>
      ) : null}
    </div>
  );
}
