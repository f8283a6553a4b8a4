'use client';

import { useState } from 'react';
import { pressureVerdict } from '@/lib/sizing';
import { pressureFromSi, pressureToSi, unitLabels, type UnitSystem } from '@/lib/units';
import { Callout, FieldInput, PrimaryAction, StepCard } from './field-ui';

// groundwaterKpa: the pressure of the repair's planned groundwater head, when the office entered one.
type Rating = { minPressureKpa: number; maxPressureKpa: number; groundwaterKpa?: number | null } | null;

/** One big button per clock step: mixed → loaded → in position. */
export function StepTap({ title, label, hint, onTap, testId }: { title: string; label: string; hint?: string; onTap: () => void; testId: string }) {
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
function PressureEntry({ id, unitSystem, rating, actionLabel, onRecord }: { id: string; unitSystem: UnitSystem; rating: Rating; actionLabel: string; onRecord: (kPa: number, confirmedOutOfRange: boolean) => void }) {
  const unit = unitLabels(unitSystem).pressure;
  const [text, setText] = useState('');
  const [confirming, setConfirming] = useState(false);
  const value = Number(text.replace(',', '.'));
  const valid = text.trim() !== '' && Number.isFinite(value) && value > 0;
  const kPa = valid ? pressureToSi(value, unitSystem) : NaN;
  const outside = valid && rating !== null && (kPa < rating.minPressureKpa || kPa > rating.maxPressureKpa);
  const verdict = valid ? pressureVerdict(kPa, rating, rating?.groundwaterKpa) : 'ok';
  const ratingText = rating ? `${fmt(rating.minPressureKpa, unitSystem)}–${fmt(rating.maxPressureKpa, unitSystem)} ${unit}` : 'unknown';
  const record = () => {
    if (!valid) return;
    if (outside && !confirming) return setConfirming(true);
    onRecord(Math.round(kPa * 10) / 10, outside);
    setText('');
    setConfirming(false);
  };
  return (
    <div className="space-y-3">
      <FieldInput id={id} label={`Gauge pressure (${unit})`} hint={`Packer rating ${ratingText}`} inputMode="decimal" value={text} onChange={(e) => { setText(e.target.value); setConfirming(false); }} />
      {verdict === 'over_rating' && (
        <div role="alert" data-testid="pressure-over-rating">
          <Callout tone="missed">
            Release pressure now: {fmt(kPa, unitSystem)} {unit} is above this packer&apos;s rating. Stand clear of the pipe ends and let air out
            until the gauge reads {ratingText}, then record that reading.
          </Callout>
        </div>
      )}
      {verdict === 'below_groundwater' && rating?.groundwaterKpa != null && (
        <div data-testid="pressure-below-groundwater">
          <Callout tone="near">
            {fmt(kPa, unitSystem)} {unit} does not beat the groundwater on this repair ({fmt(rating.groundwaterKpa, unitSystem)} {unit}): the patch
            may not be pressed to the wall. Raise the pressure within the packer&apos;s rating ({ratingText}).
          </Callout>
        </div>
      )}
      {confirming && (
        <Callout tone="missed">
          {fmt(kPa, unitSystem)} {unit} is outside this packer&apos;s rating ({ratingText}). Check the gauge. Record it anyway?
        </Callout>
      )}
      <PrimaryAction variant={confirming ? 'danger' : 'primary'} disabled={!valid} onClick={record}>
        {confirming ? 'Yes, record this pressure' : actionLabel}
      </PrimaryAction>
    </div>
  );
}

export function StepInflate({ unitSystem, rating, onInflate }: { unitSystem: UnitSystem; rating: Rating; onInflate: (kPa: number, confirmedOutOfRange: boolean) => void }) {
  return (
    <StepCard title="Inflate the bladder" testId="step-inflate">
      <p className="text-lg text-slate-700">Stand clear of the pipe ends. Read the gauge once the bladder is up.</p>
      <PressureEntry id="inflatePressure" unitSystem={unitSystem} rating={rating} actionLabel="Bladder inflated" onRecord={onInflate} />
    </StepCard>
  );
}

/** While the bladder holds: more pressure readings, and the deflate (early deflate asks why). */
export function StepHold({ unitSystem, rating, deflateAfter, holdNote, now, onPressure, onDeflate }: {
  unitSystem: UnitSystem;
  rating: Rating;
  deflateAfter: Date | null;
  /** What the deflate countdown runs to, in words (hold and reserve, or the maker's hold). */
  holdNote: string;
  now: Date;
  onPressure: (kPa: number, confirmedOutOfRange: boolean) => void;
  onDeflate: (early: { reason: string } | null) => void;
}) {
  const [asking, setAsking] = useState(false);
  const [reason, setReason] = useState('');
  const early = deflateAfter !== null && now < deflateAfter;
  return (
    <StepCard title="Holding" testId="step-hold">
      <p className="text-lg text-slate-700" data-testid="hold-note">{holdNote}</p>
      <PressureEntry id="holdPressure" unitSystem={unitSystem} rating={rating} actionLabel="Add pressure reading" onRecord={onPressure} />
      <hr className="border-slate-200" />
      {asking && early ? (
        <div className="space-y-3">
          <Callout tone="missed">The hold time is not up yet. Deflating now is recorded and flagged for the office. Why deflate early?</Callout>
          <label htmlFor="earlyReason" className="sr-only">Reason for deflating early</label>
          <textarea id="earlyReason" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} className="w-full rounded-md border-2 border-slate-400 p-2 text-lg" placeholder="Reason" />
          <PrimaryAction variant="danger" disabled={reason.trim().length < 3} onClick={() => onDeflate({ reason: reason.trim() })}>Deflate early — record it</PrimaryAction>
          <button type="button" onClick={() => setAsking(false)} className="w-full py-3 text-lg underline">Keep holding</button>
        </div>
      ) : (
        <PrimaryAction variant={early ? 'secondary' : 'primary'} onClick={() => (early ? setAsking(true) : onDeflate(null))}>Bladder deflated</PrimaryAction>
      )}
    </StepCard>
  );
}

const fmt = (kPa: number, system: UnitSystem) => pressureFromSi(kPa, system).toFixed(system === 'imperial' ? 1 : 0);
