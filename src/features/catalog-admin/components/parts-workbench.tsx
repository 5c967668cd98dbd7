import { Plus } from 'lucide-react';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { CreatePartForm } from './create-part-form';
import { PartEditor } from './part-editor';
import { PartFinder } from './part-finder';

/** Find a part by number (or make one) and edit it; the part being edited is ?part=<id>. */
export function PartsWorkbench() {
  const [params] = useSearchParams();
  const partId = params.get('part');
  const [creating, setCreating] = useState(false);
  return (
    <div className="grid gap-6 lg:grid-cols-[20rem_minmax(0,1fr)]">
      <div className="space-y-4">
        <PartFinder selectedId={partId} />
        <Button variant="secondary" size="sm" icon={<Plus aria-hidden="true" className="size-4" />} aria-expanded={creating} onClick={() => setCreating((c) => !c)}>
          New part
        </Button>
      </div>
      <div className="min-w-0 space-y-6">
        {creating ? (
          <Card>
            <h2 className="mb-4 text-lg font-bold text-ink">New part</h2>
            <CreatePartForm onDone={() => setCreating(false)} />
          </Card>
        ) : null}
        {partId ? (
          <PartEditor key={partId} partId={partId} />
        ) : creating ? null : (
          <Notice tone="info" title="Find a part to edit">
            Type any of its numbers (maker's, ordnance, stock number, standard or vendor's) in any shape.
          </Notice>
        )}
      </div>
    </div>
  );
}
