// @vitest-environment jsdom
import { zodResolver } from '@hookform/resolvers/zod';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { useForm } from 'react-hook-form';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { FormActions, type FormMessage } from '@/components/desk/form-actions';
import { Field } from '@/components/desk/form-field';
import { IntlWrapper } from '../i18n/intl';

const back = vi.fn();
vi.mock('next/navigation', () => ({ useRouter: () => ({ back, push: vi.fn(), refresh: vi.fn() }) }));

afterEach(() => cleanup());

const schema = z.object({ name: z.string().min(1, 'Give it a name'), size: z.number({ message: 'A number' }) });
type Values = z.input<typeof schema>;

function Sample({ message }: { message?: FormMessage }) {
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { name: '', size: Number.NaN } });
  return (
    <form onSubmit={form.handleSubmit(() => undefined)} noValidate>
      <Field form={form} name="name" label="Name" hint="What the crew calls it" />
      <Field form={form} name="size" label="Size" decimal valueAsNumber className="md:col-span-2" />
      <FormActions message={message} form={form} submitLabel="Create" cancel />
    </form>
  );
}

describe('Field', () => {
  it('labels its control by name, shows the hint, then the error tied by aria-describedby', async () => {
    render(<Sample />, { wrapper: IntlWrapper });
    const name = screen.getByLabelText('Name');
    expect(name.id).toBe('name');
    expect(screen.getByText('What the crew calls it')).toBeTruthy();
    const size = screen.getByLabelText('Size') as HTMLInputElement;
    expect(size.type).toBe('number');
    expect(size.getAttribute('inputmode')).toBe('decimal');
    expect(size.parentElement?.parentElement?.className).toBe('md:col-span-2');
    fireEvent.click(screen.getByRole('button', { name: 'Create' }));
    await waitFor(() => expect(screen.getByText('Give it a name')).toBeTruthy());
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(name.getAttribute('aria-describedby')).toBe('name-error');
    expect(screen.queryByText('What the crew calls it')).toBeNull();
    expect(screen.getByText('A number').id).toBe('size-error');
  });
});

describe('FormActions', () => {
  it('shows a failure as an alert and a success as a status', () => {
    const { rerender } = render(<Sample message="Could not save." />, { wrapper: IntlWrapper });
    expect(screen.getByRole('alert').textContent).toBe('Could not save.');
    rerender(<Sample message={{ ok: true, text: 'Saved.' }} />);
    expect(screen.getByRole('status').textContent).toBe('Saved.');
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('cancels by going back on a page of its own', () => {
    render(<Sample />, { wrapper: IntlWrapper });
    fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(back).toHaveBeenCalledTimes(1);
  });
});
