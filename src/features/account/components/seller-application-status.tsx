import type { SellerApplication } from '@shared/schemas/auth';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { formatDate } from '@/lib/format';

const stateLabels: Record<SellerApplication['state'], { label: string; tone: BadgeTone; text: string }> = {
  pending: { label: 'Pending review', tone: 'warn', text: 'An administrator will look at it soon. You will get an e-mail with the decision.' },
  approved: { label: 'Approved', tone: 'ok', text: 'Welcome aboard. The seller desk is open to you.' },
  rejected: { label: 'Not approved', tone: 'danger', text: 'You can correct the details and apply again below.' },
};

export function SellerApplicationStatus({ application }: { application: SellerApplication }) {
  const state = stateLabels[application.state];
  return (
    <Card>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="text-lg font-semibold text-ink">Your application</h2>
        <Badge tone={state.tone}>{state.label}</Badge>
      </div>
      <p className="mt-2 text-sm text-ink-soft">{state.text}</p>
      {application.decisionNote ? (
        <div className="mt-4 rounded-tag border-l-4 border-rule-strong bg-paper-sunk px-4 py-3 text-sm">
          <p className="font-semibold text-ink">Note from the reviewer</p>
          <p className="mt-1 whitespace-pre-line text-ink-soft">{application.decisionNote}</p>
        </div>
      ) : null}
      <dl className="mt-4 grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[9rem_1fr]">
        <dt className="font-medium text-ink-muted">Business name</dt>
        <dd className="text-ink">{application.businessName}</dd>
        <dt className="font-medium text-ink-muted">Location</dt>
        <dd className="text-ink">{application.location}</dd>
        <dt className="font-medium text-ink-muted">What you sell</dt>
        <dd className="whitespace-pre-line text-ink">{application.whatTheySell}</dd>
        <dt className="font-medium text-ink-muted">Sent</dt>
        <dd className="text-ink">{formatDate(application.createdAt)}</dd>
      </dl>
    </Card>
  );
}
