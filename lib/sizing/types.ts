import type { LibMessage } from '@/lib/i18n/message';
/** A packer (inflatable bladder) of the company's fleet, all in SI. */
export interface Packer {
  id: string | number;
  name: string;
  /** Range of host-pipe inside diameters the packer is made for, mm. */
  minDiameterMm: number;
  maxDiameterMm: number;
  /** Length of the inflatable bladder, mm. */
  bladderLengthMm: number;
  /** Bare bladder the packer needs beyond each end of the patch, mm. */
  endMarginMm: number;
  /** Allowed inflation pressure, kPa. */
  minPressureKpa: number;
  maxPressureKpa: number;
}

export interface PackerFit extends Packer {
  /** The packer as given, for callers that want the original object. */
  packer: Packer;
  fits: boolean;
  /** (bladderLength − patchLength) / 2, mm; negative when the patch is longer than the bladder. */
  endMarginEachMm: number;
  /** Why it does not fit; empty when it fits. */
  reasons: string[];
  /** `reasons` as catalogue messages, for a screen in the reader's language. */
  reasonDetails: LibMessage[];
}

export interface PressureRange {
  minPressureKpa: number;
  maxPressureKpa: number;
}

export interface ResinQuantity {
  /** Volume of the finished laminate, π·(D − t)·t·L, L. */
  laminateL: number;
  /** Resin to mix, L. */
  resinL: number;
  /** The same in US gallons. */
  resinUsGal: number;
}

export interface EndThrust {
  newtons: number;
  kilonewtons: number;
  poundsForce: number;
}
