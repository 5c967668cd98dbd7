import { zodResolver } from '@hookform/resolvers/zod';
import { Check, X } from 'lucide-react';
import { Fragment, useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { sellerApplicationDecisionInput, type SellerApplication } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/form-field';
import { formatDate } from '@/lib/format';
import { useDecideSellerApplication } from '../api/decide-seller-application';

// A rejection must tell the applicant why; the shared schema keeps the length limit.
const rejectNoteInput = sellerApplicationDecisionInput.pick({ note: true }).required().extend({
  note: z.string().trim().min(3, 'Tell the applicant why, in a few words').max(1000),
});

export function SellerApplicationsTable({ applications }: { applications: SellerApplication[] }) {
  const [rejecting, setRejecting] = useState<string | null>(null);
  const decide = useDecideSellerApplication();
  const busyId = decide.isPending ? (decide.variables?.id ?? null) : null;

  const approve = (application: SellerApplication) =>
    decide.mutate(
      { id: application.id, decision: 'approve' },
      {
        onSuccess: () => toast.success(`${application.businessName} can now sell on Drabyard.`),
        onError: (error) => toast.error(error.message),
      },
    );

  return (
    <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card">
      <table className="w-full min-w-[48rem] border-collapse text-left text-sm">
        <caption className="sr-only">Seller applications waiting for a decision</caption>
        <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
          <tr>
            <th scope="col" className="px-4 py-2.5">Business</th>
            <th scope="col" className="px-4 py-2.5">Applicant</th>
            <th scope="col" className="px-4 py-2.5">What they sell</th>
            <th scope="col" className="px-4 py-2.5">Applied</th>
            <th scope="col" className="px-4 py-2.5 text-right">Decision</th>
          </tr>
        </thead>
        <tbody>
          {applications.map((application) => (
            <Fragment key={application.id}>
              <tr className="border-t border-rule align-top">
                <th scope="row" className="px-4 py-3 font-semibold text-ink">
                  {application.businessName}
                  <span className="block font-normal text-ink-muted">{application.location}</span>
                </th>
                <td className="px-4 py-3 break-all text-ink-soft">{application.userEmail ?? application.userId}</td>
                <td className="max-w-sm px-4 py-3 whitespace-pre-line text-ink-soft">{application.whatTheySell}</td>
                <td className="px-4 py-3 whitespace-nowrap text-ink-soft">{formatDate(application.createdAt)}</td>
                <td className="px-4 py-3">
                  <div className="flex justify-end gap-2">
                    <Button
                      size="sm"
                      icon={<Check aria-hidden="true" className="size-4" />}
                      isLoading={busyId === application.id && decide.variables?.decision === 'approve'}
                      disabled={busyId !== null}
                      onClick={() => approve(application)}
                    >
                      Approve
                    </Button>
                    <Button
                      size="sm"
                      variant="danger"
                      icon={<X aria-hidden="true" className="size-4" />}
                      aria-expanded={rejecting === application.id}
                      disabled={busyId !== null}
                      onClick={() => setRejecting((id) => (id === application.id ? null : application.id))}
                    >
                      Reject
                    </Button>
                  </div>
                </td>
              </tr>
              {rejecting === application.id ? (
                <tr className="bg-danger-soft/40">
                  <td colSpan={5} className="px-4 pb-4">
                    <RejectForm
                      application={application}
                      isPending={busyId === application.id}
                      onCancel={() => setRejecting(null)}
                      onSubmit={(note) =>
                        decide.mutate(
                          { id: application.id, decision: 'reject', note },
                          {
                            onSuccess: () => {
                              setRejecting(null);
                              toast.success(`Application from ${application.businessName} rejected.`);
                            },
                            onError: (error) => toast.error(error.message),
                          },
                        )
                      }
                    />
                  </td>
                </tr>
              ) : null}
            </Fragment>
          ))}
        </tbody>
      </table>
    </div>
  );
}

type RejectFormProps = {
  application: SellerApplication;
  isPending: boolean;
  onCancel: () => void;
  onSubmit: (note: string) => void;
};

function RejectForm({ application, isPending, onCancel, onSubmit }: RejectFormProps) {
  const form = useForm({ resolver: zodResolver(rejectNoteInput), defaultValues: { note: '' } });
  const { setFocus } = form;
  useEffect(() => setFocus('note'), [setFocus]);

  return (
    <form
      noValidate
      aria-label={`Reject ${application.businessName}`}
      onSubmit={form.handleSubmit((values) => onSubmit(values.note))}
      onKeyDown={(event) => {
        if (event.key === 'Escape') onCancel();
      }}
      className="max-w-2xl space-y-3 pt-3"
    >
      <TextAreaField
        label="Note to the applicant"
        rows={3}
        hint="Sent with the decision. Say what would need to change for an approval."
        error={form.formState.errors.note?.message}
        {...form.register('note')}
      />
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="danger" isLoading={isPending}>
          Reject application
        </Button>
        <Button size="sm" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
