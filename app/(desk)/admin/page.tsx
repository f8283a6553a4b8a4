import type { Metadata } from 'next';
import { Badge } from '@/components/ui/badge';
import { requirePageUser } from '@/lib/auth/session';
import { getCompanyOverview } from '@/lib/data/company';
import { label } from '@/lib/domain';
import { formatLength, formatPressure, formatTemperature } from '@/lib/units';

export const metadata: Metadata = { title: 'Company' };

export default async function Page() {
  const user = await requirePageUser(['admin']);
  const { company, users, crews, resinSystems, resinKits, packers, checklists } = await getCompanyOverview(user);
  const units = company.unitSystem;
  return (
    <div className="space-y-8">
      <header>
        <h1 className="text-2xl font-bold">{company.name}</h1>
        <p className="text-sm text-slate-600">
          Time zone {company.timeZone} · {company.unitSystem} units · overlap {formatLength(company.minOverlapPerEndMm, units)} per end ·
          working-window reserve {Math.round(company.workingWindowSafetyMargin * 100)} %
        </p>
      </header>
      <Section title="Users">
        {users.map((u) => (
          <li key={u.id} className="flex justify-between"><span>{u.name} · {u.email}</span><span>{label(u.role)} {u.active ? '' : <Badge tone="missed">inactive</Badge>}</span></li>
        ))}
      </Section>
      <Section title="Crews">
        {crews.map((c) => (
          <li key={c.id}>{c.name} (up to {c.dailyCapacity} repairs a day): {c.members.map((m) => m.name).join(', ')}</li>
        ))}
      </Section>
      <Section title="Resin systems">
        {resinSystems.map((r) => (
          <li key={r.id}>
            {r.name}: pot life {r.potLifeMin} min, hold {r.holdMin} min, full cure {r.fullCureMin} min at {formatTemperature(r.refTempC, units)};
            range {formatTemperature(r.minTempC, units)} – {formatTemperature(r.maxTempC, units)}
          </li>
        ))}
      </Section>
      <Section title="Resin kits">
        {resinKits.map((k) => (
          <li key={k.id}>Lot {k.lot}, expires {k.expiresOn}, {k.quantityL} L</li>
        ))}
      </Section>
      <Section title="Packers">
        {packers.map((p) => (
          <li key={p.id}>
            {p.name}: {formatLength(p.minDiameterMm, units)} – {formatLength(p.maxDiameterMm, units)}, bladder {formatLength(p.bladderLengthMm, units)},
            rated {formatPressure(p.minPressureKpa, units)} – {formatPressure(p.maxPressureKpa, units)}
          </li>
        ))}
      </Section>
      <Section title="Check-list templates">
        {checklists.map((t) => (
          <li key={t.id}>{t.name}: {t.items.length} items</li>
        ))}
      </Section>
    </div>
  );
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section>
      <h2 className="mb-2 text-lg font-semibold">{title}</h2>
      <ul className="space-y-1 rounded-lg bg-white p-4 text-sm ring-1 ring-slate-200">{children}</ul>
    </section>
  );
}
