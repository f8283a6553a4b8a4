// Derives every install row a seed (or anything else outside the tap) left without its derived state, with the
// app's own derivation (lib/data/install-derive.ts). Bundled and run by scripts/derive-installs.mjs.
import { Company, sequelize } from '@/models';
import { ensureDerived, settingsOf } from '@/lib/data/install-derive';

let derived = 0;
for (const company of await Company.findAll()) {
  derived += await ensureDerived({ companyId: company.id }, settingsOf(company.get({ plain: true })), 1_000_000);
}
await sequelize.close();
console.error(`[setline] derived the state of ${derived} install${derived === 1 ? '' : 's'}`);
