import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { issueFor } from '@/lib/api-client';
import { useShareReport } from '@/features/decisions/api/share';

export function ShareForm({ scenarioId, runId }: { scenarioId: number; runId?: number }) {
  const [email, setEmail] = useState('');
  const share = useShareReport();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    share.mutate({ scenarioId, email, runId }, { onSuccess: () => setEmail('') });
  };
  return (
    <form onSubmit={submit} aria-label="E-mail a report link" className="grid gap-3 sm:grid-cols-[1fr_auto] sm:items-start">
      <TextField
        label="Colleague's e-mail"
        type="email"
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={issueFor(share.error, 'body.email')}
        hint="They get the report link and the scenario name only; reading it needs a Motewalk sign-in."
      />
      <Button type="submit" variant="secondary" className="sm:mt-6" disabled={share.isPending}>
        ✉ Send link
      </Button>
      <div className="sm:col-span-2">
        {share.isSuccess && <Notice>Link sent.</Notice>}
        {share.error && !issueFor(share.error, 'body.email') && <ErrorMessage title="Not sent" error={share.error} />}
      </div>
    </form>
  );
}
