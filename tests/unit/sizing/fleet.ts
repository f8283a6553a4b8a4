import type { Packer } from '@/lib/sizing';

// An example fleet for the tests; sizes and ratings are test inputs, not any maker's figures.
export const fleet: Packer[] = [
  {
    id: 'p1',
    name: 'Short 150',
    minDiameterMm: 140,
    maxDiameterMm: 160,
    bladderLengthMm: 1000,
    endMarginMm: 50,
    minPressureKpa: 100,
    maxPressureKpa: 250,
  },
  {
    id: 'p2',
    name: 'Long 150–200',
    minDiameterMm: 140,
    maxDiameterMm: 200,
    bladderLengthMm: 1500,
    endMarginMm: 100,
    minPressureKpa: 100,
    maxPressureKpa: 200,
  },
  {
    id: 'p3',
    name: 'Main 300',
    minDiameterMm: 250,
    maxDiameterMm: 350,
    bladderLengthMm: 2000,
    endMarginMm: 100,
    minPressureKpa: 80,
    maxPressureKpa: 150,
  },
];
