'use client';

import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import useSWR from 'swr';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Input, Select } from '@/components/ui/input';
import { fetchJson, FetchError } from '@/lib/client/fetch-json';
import { submitJson } from '@/lib/client/submit-json';
import type { RepairPlanResponse } from '@/lib/data/repairs';
import {
  convertPressure,
  formatForce,
  formatLength,
  formatNumber,
  formatPressure,
  formatVolume,
  lengthFromSi,
  lengthToSi,
  unitLabels,
  type UnitSystem,
} from '@/lib/units';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

/** A modulus in the company's units: psi, or MPa (1 psi = 6.894 757 kPa, NIST SP 811). */
const modulus = (psi: number, system: UnitSystem) =>
  system === 'imperial'
    ? `${formatNumber(psi, 0)} psi`
    : `${formatNumber(convertPressure(psi, 'psi', 'kPa') / 1000, 0)} MPa`;

type Kind = 'short' | 'long';
// Thickness in thousandths of an inch or tenths of a millimetre; heads and patch lengths as typed.
const DECIMALS: Record<UnitSystem, Record<Kind, number>> = {
  imperial: { short: 3, long: 2 },
  metric: { short: 1, long: 2 },
};

/**
 * The planning panel: the office types the groundwater head, laminate thickness (and optionally ovality and
 * another patch length) in its units; GET /api/repairs/:id/plan does the sums, so page and API agree.
 */
export function PlanPanel({
  repairId,
  initial,
  editable,
}: {
  repairId: string;
  initial: RepairPlanResponse;
  editable: boolean;
}) {
  const router = useRouter();
  const system = initial.unitSystem;
  const units = unitLabels(system);
  const shown = (mm: number | null, kind: Kind) =>
    mm == null ? '' : formatNumber(lengthFromSi(mm, system, kind), DECIMALS[system][kind]);
  const [head, setHead] = useState(shown(initial.saved.plannedGroundwaterHeadMm, 'long'));
  const [thickness, setThickness] = useState(shown(initial.saved.plannedThicknessMm, 'short'));
  const [ovality, setOvality] = useState(
    initial.saved.plannedOvalityPct == null ? '' : String(initial.saved.plannedOvalityPct),
  );
  const [patch, setPatch] = useState(shown(initial.saved.plannedPatchLengthMm, 'short'));
  const [packerId, setPackerId] = useState(initial.saved.plannedPackerId ?? '');
  const [resinSystemId, setResinSystemId] = useState(
    initial.resin?.resinSystem?.id ?? initial.resinSystems[0]?.id ?? '',
  );
  const [saved, setSaved] = useState<string>();
  const [saveError, setSaveError] = useState<string>();

  const params = new URLSearchParams();
  const put = (key: string, text: string, toSi: (n: number) => number) => {
    const n = Number(text);
    if (text.trim() !== '' && Number.isFinite(n)) params.set(key, String(toSi(n)));
  };
  put('groundwaterHeadMm', head, (n) => lengthToSi(n, system, 'long'));
  put('thicknessMm', thickness, (n) => lengthToSi(n, system, 'short'));
  put('ovalityPct', ovality, (n) => n);
  put('patchLengthMm', patch, (n) => lengthToSi(n, system, 'short'));
  if (resinSystemId) params.set('resinSystemId', resinSystemId);
  const url = `/api/repairs/${repairId}/plan?${params.toString()}`;
  const {
    data = initial,
    error,
    isLoading,
  } = useSWR<RepairPlanResponse>(url, (u: string) => fetchJson<RepairPlanResponse>(u), { keepPreviousData: true });
  const fitting = data.packers.filter((p) => p.fits);
  const chosen = fitting.some((p) => p.id === packerId) ? packerId : ((fitting[0]?.id as string | undefined) ?? '');

  const save = async () => {
    setSaved(undefined);
    setSaveError(undefined);
    const result = await submitJson(`/api/repairs/${repairId}`, 'PATCH', {
      plannedPatchLengthMm: Math.round(data.patchLengthMm),
      plannedPackerId: chosen || null,
      plannedThicknessMm: data.inputs.thicknessMm ? Math.round(data.inputs.thicknessMm * 100) / 100 : null,
      plannedGroundwaterHeadMm:
        data.inputs.groundwaterHeadMm == null ? null : Math.round(data.inputs.groundwaterHeadMm),
      plannedOvalityPct: data.inputs.ovalityPct ?? null,
    });
    if (!result.ok) return setSaveError(result.error.message);
    setSaved('Plan saved.');
    router.refresh();
  };

  return (
    <section aria-labelledby="plan-heading" className={cn(cardClass, 'space-y-4')}>
      <h2 id="plan-heading" className="text-lg font-semibold">
        Plan
      </h2>
      <div className="grid gap-3 text-sm md:grid-cols-4">
        <NumberBox
          label="Groundwater head"
          unit={units.longLength}
          hint="Water above the pipe’s invert; 0 when there is none"
          value={head}
          onChange={setHead}
        />
        <NumberBox
          label="Laminate thickness"
          unit={units.shortLength}
          hint="Of the cured patch"
          value={thickness}
          onChange={setThickness}
        />
        <NumberBox
          label="Ovality"
          unit="%"
          hint={`Blank: ${data.assumptions.ovalityPct} % assumed`}
          value={ovality}
          onChange={setOvality}
        />
        <NumberBox
          label="Length to check"
          unit={units.shortLength}
          hint="Blank: the saved or proposed patch"
          value={patch}
          onChange={setPatch}
        />
        {data.resinSystems.length > 1 && (
          <div className="flex flex-col gap-1">
            <label htmlFor={`${repairId}-resin`} className="font-medium">
              Resin system
            </label>
            <Select id={`${repairId}-resin`} value={resinSystemId} onChange={(e) => setResinSystemId(e.target.value)}>
              {data.resinSystems.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.name}
                </option>
              ))}
            </Select>
            <p className="text-xs text-slate-500">Sets the resin-to-fabric ratio and the extra mixed</p>
          </div>
        )}
      </div>
      {error && (
        <p role="alert" className="text-sm font-medium text-missed-700">
          {error instanceof FetchError ? error.message : 'Could not work out the plan.'}
        </p>
      )}

      <div aria-live="polite" aria-busy={isLoading} className="space-y-4">
        <dl className="grid grid-cols-2 gap-3 text-sm md:grid-cols-4">
          <Figure
            term="Patch length"
            value={formatLength(data.patchLengthMm, system, 'short', { decimals: DECIMALS[system].short - 1 })}
            note={
              `Proposed ${formatLength(data.proposedPatchLengthMm, system, 'short', { decimals: DECIMALS[system].short - 1 })}: defect + ` +
              `${formatLength(data.inputs.overlapPerEndMm, system)} overlap each end`
            }
          />
          <Figure term="Inside diameter" value={formatLength(data.inputs.insideDiameterMm, system)} />
          <Figure
            term="Resin to mix"
            value={data.resin ? formatVolume(data.resin.resinL, system) : '—'}
            note={
              data.resin ? `Laminate ${formatVolume(data.resin.laminateL, system)}; ${data.resin.basis}` : undefined
            }
          />
          <Figure
            term="Thickness needed"
            value={
              data.design
                ? formatLength(data.design.requiredThicknessMm, system, 'short', { decimals: DECIMALS[system].short })
                : '—'
            }
            note={data.design ? `ASTM F1216 X1: ${data.design.summary}` : undefined}
          />
        </dl>
        {data.design?.thick === true && <Badge tone="safe">Thick enough — {data.design.summary}</Badge>}

        <table className="min-w-full text-sm">
          <caption className="mb-1 text-left font-semibold">Packers</caption>
          <thead className="bg-slate-100 text-left text-xs uppercase text-slate-600">
            <tr>
              <th scope="col" className="px-2 py-1">
                Use
              </th>
              <th scope="col" className="px-2 py-1">
                Packer
              </th>
              <th scope="col" className="px-2 py-1">
                Fits
              </th>
              <th scope="col" className="px-2 py-1">
                Bare bladder each end
              </th>
              <th scope="col" className="px-2 py-1">
                Pressure range
              </th>
              <th scope="col" className="px-2 py-1">
                End thrust at top pressure
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-slate-100">
            {data.packers.map((p) => (
              <tr key={String(p.id)} className={p.fits ? '' : 'text-slate-500'}>
                <td className="px-2 py-1">
                  {p.fits && (
                    <input
                      type="radio"
                      name="packer"
                      aria-label={`Use ${p.name}`}
                      checked={chosen === p.id}
                      onChange={() => setPackerId(String(p.id))}
                    />
                  )}
                </td>
                <td className="px-2 py-1 font-medium">{p.name}</td>
                <td className="px-2 py-1">
                  {p.fits ? (
                    <Badge tone="safe">Fits</Badge>
                  ) : (
                    <span title={p.reasons.join(' ')}>No — {p.reasons[0]}</span>
                  )}
                </td>
                <td className="px-2 py-1">
                  {formatLength(p.endMarginEachMm, system)} (needs {formatLength(p.requiredEndMarginMm, system)})
                </td>
                <td className="px-2 py-1">
                  {formatPressure(p.minPressureKpa, system)} – {formatPressure(p.maxPressureKpa, system)}
                </td>
                <td className="px-2 py-1">{formatForce(p.endThrustAtMax.newtons, system)}</td>
              </tr>
            ))}
            {data.packers.length === 0 && (
              <tr>
                <td colSpan={6} className="px-2 py-3 text-slate-500">
                  The company has no packers yet (Company settings).
                </td>
              </tr>
            )}
          </tbody>
        </table>

        {data.warnings.length > 0 && (
          <ul role="alert" className="space-y-1 rounded-md bg-missed-100 p-3 text-sm font-medium text-missed-700">
            {data.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        )}
        {data.notes.length > 0 && (
          <ul className="text-sm text-slate-600">
            {data.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        )}
        <p className="text-xs text-slate-500">
          Thickness check assumes a long-term modulus of {modulus(data.assumptions.longTermModulusPsi, system)} and a
          short-term one of {modulus(data.assumptions.shortTermModulusPsi, system)}, enhancement factor K ={' '}
          {data.assumptions.enhancementK}, safety factor N = {data.assumptions.safetyFactor}, Poisson’s ratio{' '}
          {data.assumptions.poisson}; the patch’s outside diameter is taken as the pipe’s inside diameter. X1.3 is
          worked in the form of ASTM F1216-07b and later editions.
        </p>
      </div>

      <div className="flex flex-wrap items-end gap-3 border-t border-slate-200 pt-3 text-sm">
        <p>
          {chosen
            ? 'Saves the patch length, the packer picked above, the thickness and the groundwater figures.'
            : 'No packer fits: the plan saves without one.'}
        </p>
        <Button type="button" onClick={save} disabled={!editable || isLoading || Boolean(error)}>
          Save plan
        </Button>
        {!editable && (
          <span className="text-slate-500">The plan is fixed once an install has started or the job is closed.</span>
        )}
        {saved && (
          <span role="status" className="text-safe-700">
            {saved}
          </span>
        )}
        {saveError && (
          <span role="alert" className="text-missed-700">
            {saveError}
          </span>
        )}
      </div>
      <p className="rounded-md bg-near-100 p-3 text-xs text-near-700">{data.caution}</p>
    </section>
  );
}

function NumberBox({
  label,
  unit,
  hint,
  value,
  onChange,
}: {
  label: string;
  unit: string;
  hint: string;
  value: string;
  onChange: (value: string) => void;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <div className="flex items-center gap-1">
        <Input
          id={id}
          type="number"
          step="any"
          min="0"
          inputMode="decimal"
          value={value}
          onChange={(e) => onChange(e.target.value)}
          aria-describedby={`${id}-hint`}
          className="w-full"
        />
        <span className="text-slate-600">{unit}</span>
      </div>
      <p id={`${id}-hint`} className="text-xs text-slate-500">
        {hint}
      </p>
    </div>
  );
}

function Figure({ term, value, note }: { term: string; value: string; note?: string }) {
  return (
    <div>
      <dt className="text-slate-500">{term}</dt>
      <dd className="text-base font-semibold">{value}</dd>
      {note && <dd className="text-xs text-slate-500">{note}</dd>}
    </div>
  );
}
