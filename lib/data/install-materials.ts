import 'server-only';
import type { InferAttributes } from 'sequelize';
import { Packer, ResinKit, ResinSystem } from '@/models';

/**
 * What an install's clock and flags read of its materials (lib/install/plan-and-flags.ts): the resin system whole,
 * the kit's lot and expiry, the packer's pressure rating. The install lists, the live board and the report load
 * them alike, so the aliases and columns are named once.
 */
export const CLOCK_MATERIALS_INCLUDE = [
  { model: ResinSystem, as: 'resinSystem' },
  { model: ResinKit, as: 'resinKit', attributes: ['id', 'lot', 'expiresOn'] },
  { model: Packer, as: 'packer', attributes: ['id', 'minPressureKpa', 'maxPressureKpa'] },
];

/** The columns CLOCK_MATERIALS_INCLUDE puts on a plain install row. */
export type ClockMaterials = {
  resinSystem: InferAttributes<ResinSystem> | null;
  resinKit: Pick<InferAttributes<ResinKit>, 'id' | 'lot' | 'expiresOn'> | null;
  packer: Pick<InferAttributes<Packer>, 'id' | 'minPressureKpa' | 'maxPressureKpa'> | null;
};
