// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { Badge } from '@/components/ui/badge';
import { Button, buttonVariants } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { deskNav, fieldNav, navFor } from '@/config/nav';
import { cn } from '@/lib/ui/cn';

afterEach(() => cleanup());

describe('cn', () => {
  it('drops falsy parts and lets the later of two conflicting utilities win', () => {
    expect(cn('px-2 py-1', false, undefined, 'px-4')).toBe('py-1 px-4');
    expect(cn('text-sm', { 'text-lg': true, hidden: false })).toBe('text-lg');
  });

  it('treats our min-h-touch like any other min-height', () => {
    expect(cn('min-h-touch px-6', 'min-h-[4rem]')).toBe('px-6 min-h-[4rem]');
    expect(cn('min-h-[4rem]', 'min-h-touch')).toBe('min-h-touch');
  });

  it('merges a caller class into a variant without piling up conflicts', () => {
    const classes = cn(buttonVariants({ variant: 'secondary', size: 'field' }), 'text-2xl').split(' ');
    expect(classes).toContain('text-2xl');
    expect(classes).not.toContain('text-lg');
  });
});

describe('primitives', () => {
  it('Button: primary desk by default, the caller class merged last', () => {
    render(<Button className="w-full">Save</Button>);
    const button = screen.getByRole('button', { name: 'Save' });
    expect(button.className).toContain('bg-brand-700');
    expect(button.className).toContain('h-9');
    expect(button.className).toContain('w-full');
  });

  it('Badge: the tone picks the semantic colours', () => {
    render(<Badge tone="missed">expired</Badge>);
    expect(screen.getByText('expired').className).toContain('text-missed-700');
  });

  it('PageHeader: one h1, the back link and the actions', () => {
    render(
      <PageHeader
        title="Packers"
        back={{ href: '/admin', label: 'Company' }}
        actions={<button type="button">Archive</button>}
      />,
    );
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Packers');
    expect(screen.getByRole('link', { name: '← Company' }).getAttribute('href')).toBe('/admin');
    expect(screen.getByRole('button', { name: 'Archive' })).toBeTruthy();
  });
});

describe('navigation', () => {
  it('shows the office everything but the company settings, which only an admin sees', () => {
    const office = navFor(deskNav, 'office').map((item) => item.href);
    expect(office).not.toContain('/admin');
    expect(office).toContain('/reviews');
    expect(navFor(deskNav, 'admin').map((item) => item.href)).toEqual([...office, '/admin']);
    expect(navFor(deskNav, 'technician')).toEqual([]);
    expect(navFor(fieldNav, 'technician').map((item) => item.href)).toEqual(['/today']);
  });
});
