// Corvel Motion Works' bench, stockroom and parts (all invented). Weights in grams.
export const DEMO_SCALES = [
  {
    name: 'Bench 1 · fine',
    location: 'Kitting bench 1',
    accuracyClass: 'II' as const,
    capacity: 620,
    division: 0.001,
    verificationInterval: 0.01,
    repeatability: 0.0008,
  },
  {
    name: 'Bench 2 · kitting',
    location: 'Kitting bench 2',
    accuracyClass: 'III' as const,
    capacity: 6000,
    division: 0.1,
    verificationInterval: 1,
    repeatability: 0.05,
  },
  {
    name: 'Stockroom platform',
    location: 'Stockroom, aisle K',
    accuracyClass: 'III' as const,
    capacity: 60000,
    division: 2,
    verificationInterval: 10,
    repeatability: 1,
  },
  {
    name: 'Bench 3 · serial',
    location: 'Kitting bench 3',
    accuracyClass: 'III' as const,
    capacity: 15000,
    division: 0.5,
    verificationInterval: 5,
    repeatability: 0.3,
  },
];

export const DEMO_CONTAINERS = [
  { name: 'Kit bag 150×200', kind: 'bag' as const, tare: 3.8 },
  { name: 'Kit tray KT-6', kind: 'tray' as const, tare: 212.5 },
  { name: 'Blue bin, size 3', kind: 'bin' as const, tare: 410 },
  { name: 'Tote 40 L', kind: 'tote' as const, tare: 1850 },
];

// apw: the demo's "true" piece weight, used to make plausible samples; spread: its σ/μ.
export const DEMO_PARTS = [
  {
    partNumber: 'CMW-SCR-M3X8',
    description: 'Pan head screw M3 × 8, A2 stainless',
    apw: 0.62,
    spread: 0.012,
    stock: 6000,
    bin: 'K-01-1-01',
    abc: 'A' as const,
  },
  { partNumber: 'CMW-SCR-M4X12', description: 'Socket head cap screw M4 × 12', apw: 1.88, spread: 0.01, stock: 3000, bin: 'K-01-1-02', abc: 'A' as const },
  { partNumber: 'CMW-WSH-M3', description: 'Flat washer M3, A2', apw: 0.105, spread: 0.03, stock: 9000, bin: 'K-01-2-01', abc: 'B' as const },
  { partNumber: 'CMW-NUT-M3', description: 'Hex nut M3, A2', apw: 0.36, spread: 0.015, stock: 4000, bin: 'K-01-2-02', abc: 'B' as const },
  {
    partNumber: 'CMW-STD-M3X12',
    description: 'Standoff M3 × 12, brass, female–female',
    apw: 1.92,
    spread: 0.008,
    stock: 1500,
    bin: 'K-02-1-01',
    abc: 'B' as const,
  },
  { partNumber: 'CMW-SPR-C040', description: 'Compression spring 4 × 12 mm', apw: 0.27, spread: 0.025, stock: 800, bin: 'K-02-1-02', abc: 'C' as const },
  { partNumber: 'CMW-PIN-D2X10', description: 'Dowel pin Ø2 × 10 mm', apw: 0.246, spread: 0.005, stock: 2500, bin: 'K-02-2-01', abc: 'C' as const },
  { partNumber: 'CMW-CLP-E3', description: 'E-clip for 3 mm shaft', apw: 0.048, spread: 0.04, stock: 5000, bin: 'K-02-2-02', abc: 'C' as const },
  { partNumber: 'CMW-BRG-623', description: 'Ball bearing 623-2Z', apw: 2.21, spread: 0.006, stock: 120, bin: 'K-03-1-01', abc: 'A' as const },
  { partNumber: 'CMW-ORG-6X1', description: 'O-ring 6 × 1, NBR 70', apw: 0.063, spread: 0.05, stock: 2000, bin: 'K-03-1-02', abc: 'C' as const },
];

export const DEMO_HAND_PARTS = [{ partNumber: 'CMW-LBL-RATE', description: 'Rating plate label, LA-20' }];

export const DEMO_KITS = [
  {
    code: 'CMW-LA20-ENDCAP',
    revision: 'B',
    description: 'End-cap kit, LA-20 linear actuator',
    lines: [
      ['CMW-SCR-M3X8', 4, 0, 1],
      ['CMW-WSH-M3', 4, 0, 1],
      ['CMW-STD-M3X12', 2, 0, 0],
      ['CMW-ORG-6X1', 1, 0, 1],
    ] as const,
  },
  {
    code: 'CMW-LA20-DRIVE',
    revision: 'A',
    description: 'Drive kit, LA-20 linear actuator',
    lines: [
      ['CMW-SCR-M4X12', 6, 0, 0],
      ['CMW-BRG-623', 2, 0, 0],
      ['CMW-PIN-D2X10', 2, 0, 0],
      ['CMW-SPR-C040', 1, 0, 0],
      ['CMW-CLP-E3', 2, 0, 1],
      ['CMW-NUT-M3', 4, 0, 0],
    ] as const,
  },
];

export const DEMO_TEST_WEIGHTS = [
  ...[1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000].map((g) => ({
    identifier: `CMW-TW-F1-${g >= 1000 ? `${g / 1000}KG` : `${g}G`}`,
    nominal: g,
    weightClass: 'F1' as const,
  })),
  { identifier: 'CMW-TW-M1-10KG', nominal: 10000, weightClass: 'M1' as const },
  { identifier: 'CMW-TW-M1-20KG-A', nominal: 20000, weightClass: 'M1' as const },
  { identifier: 'CMW-TW-M1-20KG-B', nominal: 20000, weightClass: 'M1' as const },
];
