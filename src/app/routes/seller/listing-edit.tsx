import { Eye, Send } from 'lucide-react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { toast } from 'sonner';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button, buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useChangeListingState, type SellerListingAction } from '@/features/listings/api/change-listing-state';
import { useDeleteListing } from '@/features/listings/api/delete-listing';
import { useListing } from '@/features/listings/api/get-listing';
import { useUpdateListing } from '@/features/listings/api/update-listing';
import { ListingForm } from '@/features/listings/components/listing-form';
import { listingToFormValues } from '@/features/listings/components/listing-form-values';
import { ListingStateBadge } from '@/features/listings/components/listing-state-badge';
import { PhotoManager } from '@/features/listings/components/photo-manager';
import { useShippingProfiles } from '@/features/seller/api/get-shipping-profiles';

const actionText: Record<SellerListingAction, { label: string; done: string }> = {
  submit: { label: 'Submit for review', done: 'Submitted: an administrator reviews it next' },
  withdraw: { label: 'Withdraw', done: 'Withdrawn: buyers no longer see it' },
  reopen: { label: 'Reopen as draft', done: 'Reopened as a draft' },
};

export function SellerListingEditRoute() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const page = useListing(id);
  const profiles = useShippingProfiles();
  const update = useUpdateListing();
  const change = useChangeListingState();
  const remove = useDeleteListing();

  if (page.isPending || profiles.isPending) return <PageSkeleton label="Loading the listing" />;
  if (page.isError) {
    return (
      <ContentLayout title="Listing not found" eyebrow="Seller desk">
        <Notice tone="danger" role="alert" title={page.error.message} />
      </ContentLayout>
    );
  }
  const { listing, viewer, events } = page.data;
  const allowed = new Set(viewer.allowedActions);
  const editable = allowed.has('edit');
  const lastDecision = [...(events ?? [])].reverse().find((e) => e.message && (e.toState === 'changes_requested' || e.toState === 'rejected'));
  const neverSubmitted = listing.state === 'draft' && !listing.submittedAt;

  const act = (action: SellerListingAction) =>
    change.mutate({ id, action }, { onSuccess: () => toast.success(actionText[action].done), onError: (e) => toast.error(e.message) });

  return (
    <ContentLayout
      title={listing.title}
      eyebrow="Seller desk · edit listing"
      description={
        <span className="flex flex-wrap items-center gap-2">
          <ListingStateBadge state={listing.state} />
          {listing.state === 'approved' ? 'Live. Changing quantity, price, description or shipping keeps it live; other changes send it back to review.' : null}
        </span>
      }
      actions={
        <Link to={paths.listing.getHref(id)} className={buttonClasses('ghost', 'sm')}>
          <Eye aria-hidden="true" className="size-4" /> View as buyers see it
        </Link>
      }
    >
      <div className="space-y-6">
        {lastDecision && (listing.state === 'changes_requested' || listing.state === 'rejected') ? (
          <Notice tone={listing.state === 'rejected' ? 'danger' : 'warn'} title={listing.state === 'rejected' ? 'Rejected' : 'Changes requested'}>
            <p>{lastDecision.message}</p>
          </Notice>
        ) : null}
        {listing.flags?.length ? (
          <Notice tone="warn" title="Flags the review will look at">
            <ul className="list-disc pl-5">
              {listing.flags.map((f) => (
                <li key={f.code}>{f.message}</li>
              ))}
            </ul>
          </Notice>
        ) : null}

        {editable ? <PhotoManager listingId={id} photos={listing.photos} title={listing.title} /> : null}

        <div className="flex flex-wrap items-center gap-3 rounded-card border border-rule bg-paper-sunk/60 px-4 py-3">
          {allowed.has('submit') ? (
            <Button icon={<Send aria-hidden="true" className="size-4" />} isLoading={change.isPending && change.variables?.action === 'submit'} onClick={() => act('submit')}>
              {actionText.submit.label}
            </Button>
          ) : null}
          {allowed.has('reopen') ? (
            <Button variant="secondary" onClick={() => act('reopen')}>
              {actionText.reopen.label}
            </Button>
          ) : null}
          {allowed.has('withdraw') ? (
            <Button variant="secondary" onClick={() => act('withdraw')}>
              {actionText.withdraw.label}
            </Button>
          ) : null}
          {neverSubmitted ? (
            <Button
              variant="danger"
              onClick={() => {
                if (!window.confirm('Delete this draft and its photos?')) return;
                remove.mutate(id, {
                  onSuccess: () => {
                    toast.success('Draft deleted');
                    navigate(paths.seller.getHref());
                  },
                  onError: (e) => toast.error(e.message),
                });
              }}
            >
              Delete draft
            </Button>
          ) : null}
          <p className="text-sm text-ink-muted">
            {listing.photos.length === 0 && allowed.has('submit') ? 'Add photos before you submit: reviewers look for the real part and its marks.' : null}
          </p>
        </div>

        {editable ? (
          <ListingForm
            key={listing.updatedAt}
            mode="edit"
            defaultValues={listingToFormValues(listing)}
            shippingProfiles={profiles.data ?? []}
            submitLabel="Save changes"
            isPending={update.isPending}
            onSubmit={async (input) => {
              await update.mutateAsync({ id, ...input });
              toast.success('Saved');
            }}
          />
        ) : (
          <Notice tone="info" title="This listing can no longer be edited" />
        )}
      </div>
    </ContentLayout>
  );
}
