// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { StepInflate } from '@/app/(field)/installs/[id]/step-cure';
import { IntlWrapper } from '../i18n/intl';

// Vitest runs without globals, so Testing Library cannot unmount by itself between tests.
afterEach(() => cleanup());

const rating = { minPressureKpa: 70, maxPressureKpa: 150, groundwaterKpa: 80 };

function typePressure(text: string) {
  fireEvent.change(screen.getByLabelText(/Gauge pressure/), { target: { value: text } });
}

describe('<StepInflate> pressure entry', () => {
  it('above the packer’s rating tells the crew to release pressure into the rated range before anything else', () => {
    const onInflate = vi.fn();
    render(<StepInflate unitSystem="metric" rating={rating} onInflate={onInflate} />, { wrapper: IntlWrapper });
    typePressure('200');
    const alert = screen.getByTestId('pressure-over-rating');
    expect(alert).toHaveTextContent("Release pressure now: 200 kPa is above this packer's rating");
    expect(alert).toHaveTextContent('until the gauge reads 70–150 kPa');
    // The release instruction stands first on the step, before any way to record.
    const step = screen.getByTestId('step-inflate');
    expect(step.textContent!.indexOf('Release pressure now')).toBeLessThan(
      step.textContent!.indexOf('Bladder inflated'),
    );
    fireEvent.click(screen.getByRole('button', { name: 'Bladder inflated' }));
    expect(onInflate).not.toHaveBeenCalled();
  });

  it('in an imperial company says it in psi: 200 kPa typed as 29 psi (1 psi = 6.894 757 kPa, NIST SP 811)', () => {
    render(<StepInflate unitSystem="imperial" rating={rating} onInflate={() => {}} />, { wrapper: IntlWrapper });
    typePressure('29');
    expect(screen.getByTestId('pressure-over-rating')).toHaveTextContent("29.0 psi is above this packer's rating");
    expect(screen.getByTestId('pressure-over-rating')).toHaveTextContent('10.2–21.8 psi');
    expect(screen.getByTestId('step-inflate')).not.toHaveTextContent('kPa');
  });

  it('below the known groundwater pressure warns, and records within the rating without asking', () => {
    const onInflate = vi.fn();
    render(<StepInflate unitSystem="metric" rating={rating} onInflate={onInflate} />, { wrapper: IntlWrapper });
    typePressure('75');
    expect(screen.getByTestId('pressure-below-groundwater')).toHaveTextContent(
      '75 kPa does not beat the groundwater on this repair (80 kPa)',
    );
    typePressure('100');
    expect(screen.queryByTestId('pressure-below-groundwater')).toBeNull();
    expect(screen.queryByTestId('pressure-over-rating')).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Bladder inflated' }));
    expect(onInflate).toHaveBeenCalledWith(100, false);
  });
});
