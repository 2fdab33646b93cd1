import { useState, type FormEvent } from 'react';
import { ROLES, ROLE_LABELS, type Role } from '../../../../shared/auth/permissions';
import { inviteSchema } from '../../../../shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { fieldErrors } from '@/lib/form-errors';
import { useInvitePerson } from '@/features/people/api/invite-person';

export function InviteForm() {
  const [form, setForm] = useState({ email: '', name: '', role: 'viewer' as Role });
  const [submitted, setSubmitted] = useState(false);
  const invite = useInvitePerson();
  const parsed = inviteSchema.safeParse(form);
  const errors = submitted ? fieldErrors(parsed, invite.error) : {};

  function submit(e: FormEvent) {
    e.preventDefault();
    setSubmitted(true);
    if (!parsed.success) return;
    invite.mutate(parsed.data, {
      onSuccess: () => {
        setForm({ email: '', name: '', role: 'viewer' });
        setSubmitted(false);
      },
    });
  }

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Invite a person"
      className="grid gap-4 rounded-lg border border-line bg-white p-4 sm:grid-cols-[1fr_1fr_12rem_auto] sm:items-start"
    >
      <TextField label="Name" value={form.name} onChange={(e) => setForm({ ...form, name: e.target.value })} error={errors.name} />
      <TextField
        label="E-mail"
        type="email"
        value={form.email}
        onChange={(e) => setForm({ ...form, email: e.target.value })}
        error={errors.email}
      />
      <SelectField label="Role" value={form.role} onChange={(e) => setForm({ ...form, role: e.target.value as Role })} error={errors.role}>
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </SelectField>
      <Button type="submit" className="sm:mt-6" disabled={invite.isPending}>
        {invite.isPending ? 'Sending…' : 'Send invitation'}
      </Button>
      <div className="sm:col-span-4">
        {invite.isSuccess && <Notice>Invitation sent to {invite.data.email}. The link is valid for 72 hours.</Notice>}
        {invite.error && <ErrorMessage title="Not invited" error={invite.error} />}
      </div>
    </form>
  );
}
