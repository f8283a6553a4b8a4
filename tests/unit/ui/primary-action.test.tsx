// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { renderToString } from 'react-dom/server';
import { hydrateRoot } from 'react-dom/client';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { PrimaryAction } from '@/components/field/primary-action';

afterEach(() => cleanup());

// A tap on the server's HTML, before React runs the page, would do nothing: the crew must not be able to make it.
describe('PrimaryAction before and after the page runs', () => {
  it('is disabled in the server HTML and enabled once hydrated, then records the tap', async () => {
    const onClick = vi.fn();
    const html = renderToString(<PrimaryAction onClick={onClick}>Resin mixed</PrimaryAction>);
    expect(html).toMatch(/<button[^>]* disabled=""/);

    const container = document.createElement('div');
    container.innerHTML = html;
    document.body.appendChild(container);
    const button = container.querySelector('button')!;
    expect(button.disabled).toBe(true);
    await act(async () => {
      hydrateRoot(container, <PrimaryAction onClick={onClick}>Resin mixed</PrimaryAction>);
    });
    expect(button.disabled).toBe(false);
    fireEvent.click(button);
    expect(onClick).toHaveBeenCalledTimes(1);
    container.remove();
  });

  it('stays disabled when its step says so', () => {
    render(
      <PrimaryAction onClick={() => undefined} disabled>
        Bladder inflated
      </PrimaryAction>,
    );
    expect((screen.getByRole('button', { name: 'Bladder inflated' }) as HTMLButtonElement).disabled).toBe(true);
  });
});
