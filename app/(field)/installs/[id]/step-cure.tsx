'use client';

import { useLocale, useTranslations } from 'next-intl';
import { useState } from 'react';
import { pressureVerdict } from '@/lib/sizing';
import { formatNumber, pressureFromSi, pressureToSi, unitLabels, type UnitSystem } from '@/lib/units';
import { Callout, FieldInput, PrimaryAction, StepCard } from '@/app/(field)/installs/[id]/field-ui';

// groundwaterKpa: the pressure of the repair's planned groundwater head, when the office entered one.
type Rating = { minPressureKpa: number; maxPressureKpa: number; groundwaterKpa?: number | null } | null;

/** One big button per clock step: mixed → loaded → in position. */
export function StepTap({
  title,
  label,
  hint,
  onTap,
  testId,
}: {
  title: string;
  label: string;
  hint?: string;
  onTap: () => void;
  testId: string;
}) {
  return (
    <StepCard title={title} testId={testId}>
      {hint && <p className="text-lg text-slate-700">{hint}</p>}
      <PrimaryAction onClick={onTap}>{label}</PrimaryAction>
    </StepCard>
  );
}

/**
 * A pressure read from the gauge, in the company's units. Above the packer's rating the first thing said is to
 * let pressure out into the rated range; below the rating or the groundwater head it warns. Anything outside the
 * rating is recorded only after a second tap.
 */
function PressureEntry({
  id,
  unitSystem,
  rating,
  actionLabel,
  onRecord,
}: {
  id: string;
  unitSystem: UnitSystem;
  rating: Rating;
  actionLabel: string;
  onRecord: (kPa: number, confirmedOutOfRange: boolean) => void;
}) {
  const t = useTranslations('install.clock');
  const locale = useLocale();
  const fmt = (kPa: number, system: UnitSystem) =>
    formatNumber(pressureFromSi(kPa, system), system === 'imperial' ? 1 : 0, locale);
  const unit = unitLabels(unitSystem).pressure;
  const [text, setText] = useState('');
  const [confirming, setConfirming] = useState(false);
  const value = Number(text.replace(',', '.'));
  const valid = text.trim() !== '' && Number.isFinite(value) && value > 0;
  const kPa = valid ? pressureToSi(value, unitSystem) : NaN;
  const outside = valid && rating !== null && (kPa < rating.minPressureKpa || kPa > rating.maxPressureKpa);
  const verdict = valid ? pressureVerdict(kPa, rating, rating?.groundwaterKpa) : 'ok';
  const ratingText = rating
    ? `${fmt(rating.minPressureKpa, unitSystem)}–${fmt(rating.maxPressureKpa, unitSystem)} ${unit}`
    : t('ratingUnknown');
  const reading = valid ? `${fmt(kPa, unitSystem)} ${unit}` : '';
  const record = () => {
    if (!valid) return;
    if (outside && !confirming) return setConfirming(true);
    onRecord(Math.round(kPa * 10) / 10, outside);
    setText('');
    setConfirming(false);
  };
  return (
    <div className="space-y-3">
      <FieldInput
        id={id}
        label={t('gauge', { unit })}
        hint={t('rating', { rating: ratingText })}
        inputMode="decimal"
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setConfirming(false);
        }}
      />
      {verdict === 'over_rating' && (
        <div role="alert" data-testid="pressure-over-rating">
          <Callout tone="missed">{t('overRating', { value: reading, rating: ratingText })}</Callout>
        </div>
      )}
      {verdict === 'below_groundwater' && rating?.groundwaterKpa != null && (
        <div data-testid="pressure-below-groundwater">
          <Callout tone="near">
            {t('belowGroundwater', {
              value: reading,
              groundwater: `${fmt(rating.groundwaterKpa, unitSystem)} ${unit}`,
              rating: ratingText,
            })}
          </Callout>
        </div>
      )}
      {confirming && <Callout tone="missed">{t('outsideConfirm', { value: reading, rating: ratingText })}</Callout>}
      <PrimaryAction variant={confirming ? 'danger' : 'primary'} disabled={!valid} onClick={record}>
        {confirming ? t('recordAnyway') : actionLabel}
      </PrimaryAction>
    </div>
  );
}

export function StepInflate({
  unitSystem,
  rating,
  onInflate,
}: {
  unitSystem: UnitSystem;
  rating: Rating;
  onInflate: (kPa: number, confirmedOutOfRange: boolean) => void;
}) {
  const t = useTranslations('install.clock');
  return (
    <StepCard title={t('inflateTitle')} testId="step-inflate">
      <p className="text-lg text-slate-700">{t('inflateHint')}</p>
      <PressureEntry
        id="inflatePressure"
        unitSystem={unitSystem}
        rating={rating}
        actionLabel={t('inflated')}
        onRecord={onInflate}
      />
    </StepCard>
  );
}

/** While the bladder holds: more pressure readings, and the deflate (early deflate asks why). */
export function StepHold({
  unitSystem,
  rating,
  deflateAfter,
  holdNote,
  now,
  onPressure,
  onDeflate,
}: {
  unitSystem: UnitSystem;
  rating: Rating;
  deflateAfter: Date | null;
  /** What the deflate countdown runs to, in words (hold and reserve, or the maker's hold). */
  holdNote: string;
  now: Date;
  onPressure: (kPa: number, confirmedOutOfRange: boolean) => void;
  onDeflate: (early: { reason: string } | null) => void;
}) {
  const t = useTranslations('install.clock');
  const [asking, setAsking] = useState(false);
  const [reason, setReason] = useState('');
  const early = deflateAfter !== null && now < deflateAfter;
  return (
    <StepCard title={t('holdTitle')} testId="step-hold">
      <p className="text-lg text-slate-700" data-testid="hold-note">
        {holdNote}
      </p>
      <PressureEntry
        id="holdPressure"
        unitSystem={unitSystem}
        rating={rating}
        actionLabel={t('addReading')}
        onRecord={onPressure}
      />
      <hr className="border-slate-200" />
      {asking && early ? (
        <div className="space-y-3">
          <Callout tone="missed">{t('earlyWarning')}</Callout>
          <label htmlFor="earlyReason" className="sr-only">
            {t('earlyReason')}
          </label>
          <textarea
            id="earlyReason"
            rows={2}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            className="w-full rounded-md border-2 border-slate-400 p-2 text-lg"
            placeholder={t('reason')}
          />
          <PrimaryAction
            variant="danger"
            disabled={reason.trim().length < 3}
            onClick={() => onDeflate({ reason: reason.trim() })}
          >
            {t('deflateEarly')}
          </PrimaryAction>
          <button type="button" onClick={() => setAsking(false)} className="w-full py-3 text-lg underline">
            {t('keepHolding')}
          </button>
        </div>
      ) : (
        <PrimaryAction
          variant={early ? 'secondary' : 'primary'}
          onClick={() => (early ? setAsking(true) : onDeflate(null))}
        >
          {t('deflated')}
        </PrimaryAction>
      )}
    </StepCard>
  );
}
