import { fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { useSchemaSubmit } from './use-schema-submit';

const schema = z.object({ password: z.string().min(3, 'Too short') });

function Harness({ password, repeat, mutate }: { password: string; repeat: string; mutate: (v: unknown) => void }) {
  const mutation = { mutate: (v: { password: string }) => mutate(v), error: undefined };
  const checks = { repeat: repeat !== password ? 'The two differ' : undefined };
  const { errors, submit } = useSchemaSubmit(schema, { password }, mutation, undefined, checks);
  return (
    <form aria-label="Harness" onSubmit={submit}>
      <output data-testid="errors">{JSON.stringify(errors)}</output>
    </form>
  );
}

const errorsShown = () => JSON.parse(screen.getByTestId('errors').textContent ?? '{}');
const send = () => fireEvent.submit(screen.getByRole('form', { name: 'Harness' }));

// Common practice for forms: nothing is said before the first submit, and nothing is sent while any message stands.
describe('useSchemaSubmit', () => {
  it('keeps quiet until the first submit, then shows the schema’s and the local check’s messages and sends nothing', () => {
    const mutate = vi.fn();
    render(<Harness password="ab" repeat="abc" mutate={mutate} />);
    expect(errorsShown()).toEqual({});
    send();
    expect(errorsShown()).toEqual({ password: 'Too short', repeat: 'The two differ' });
    expect(mutate).not.toHaveBeenCalled();
  });

  it('holds back a payload the schema accepts while a local check fails, and sends it once the check passes', () => {
    const mutate = vi.fn();
    const { rerender } = render(<Harness password="abcd" repeat="abc" mutate={mutate} />);
    send();
    expect(mutate).not.toHaveBeenCalled();
    rerender(<Harness password="abcd" repeat="abcd" mutate={mutate} />);
    send();
    expect(mutate).toHaveBeenCalledWith({ password: 'abcd' });
  });
});
