// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import RootError from '@/app/error';
import { ErrorView, SectionErrorView } from '@/components/shell/error-view';
import { ErrorWordsProvider } from '@/components/shell/error-words';
import es from '@/messages/es.json';
import { IntlWrapper } from '../i18n/intl';

afterEach(cleanup);

const noop = () => undefined;

describe('the section error page', () => {
  it('reads in English as the page without a catalogue does', () => {
    const { container: plain } = render(<ErrorView reset={noop} />);
    const english = plain.innerHTML;
    cleanup();
    const { container } = render(
      <IntlWrapper>
        <SectionErrorView reset={noop} />
      </IntlWrapper>,
    );
    expect(container.innerHTML).toBe(english);
  });

  it('reads in Spanish for a Spanish reader', () => {
    render(
      <IntlWrapper locale="es">
        <SectionErrorView reset={noop} />
      </IntlWrapper>,
    );
    expect(screen.getByRole('heading').textContent).toBe('Algo salió mal');
    expect(screen.getByRole('button').textContent).toBe('Volver a intentar');
  });

  it("the root's page takes the words the root layout hands down (a Spanish reader's here)", () => {
    render(
      <ErrorWordsProvider words={es.common.error}>
        <RootError error={new Error('boom')} reset={noop} />
      </ErrorWordsProvider>,
    );
    expect(screen.getByRole('heading').textContent).toBe('Algo salió mal');
    expect(screen.getByRole('button').textContent).toBe('Volver a intentar');
    expect(document.body.textContent).not.toContain('boom');
  });
});
