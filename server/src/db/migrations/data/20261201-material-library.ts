/**
 * The global material library as migration 20261201-0005 seeded it: frozen with that migration
 * (migrations are history; a later change to the library is a new migration that updates rows).
 * Nominal densities of common sports-equipment materials with a typical relative scatter and the
 * source of each figure.
 * Wood figures: USDA Forest Products Laboratory, Wood Handbook (FPL-GTR-282, 2021), Table 5-3a/5-3b,
 * specific gravity at 12 % moisture content converted to density at 12 % MC as SG × 1000 × 1.12;
 * the specific gravities are quoted from memory of that table. Tolerances are common practice
 * (MECHANICS §6: ±5 % is a usual design allowance for wood; tighter for metals and polymers).
 */
export interface LibraryMaterial {
  name: string;
  family: 'wood' | 'metal' | 'composite' | 'polymer' | 'foam' | 'elastomer' | 'natural' | 'other';
  density: number;
  densityTolerance: number;
  source: string;
}

const woodHandbook = (sg: number) =>
  `USDA Wood Handbook FPL-GTR-282, Table 5-3: specific gravity ${sg} at 12 % MC (value from memory), × 1120 kg/m³`;

export const MATERIAL_LIBRARY: LibraryMaterial[] = [
  { name: 'White ash', family: 'wood', density: Math.round(0.6 * 1120), densityTolerance: 0.08, source: woodHandbook(0.6) },
  { name: 'Sugar maple', family: 'wood', density: Math.round(0.63 * 1120), densityTolerance: 0.08, source: woodHandbook(0.63) },
  { name: 'Shagbark hickory', family: 'wood', density: Math.round(0.72 * 1120), densityTolerance: 0.08, source: woodHandbook(0.72) },
  {
    name: 'Balsa',
    family: 'wood',
    density: Math.round(0.16 * 1120),
    densityTolerance: 0.25,
    source: `${woodHandbook(0.16)}; balsa scatters widely (common practice)`,
  },
  {
    name: 'Aluminium 6061-T6',
    family: 'metal',
    density: 2700,
    densityTolerance: 0.01,
    source: 'ASM Handbook Vol. 2, wrought aluminium alloy 6061 (value from memory)',
  },
  {
    name: 'Aluminium 7075-T6',
    family: 'metal',
    density: 2810,
    densityTolerance: 0.01,
    source: 'ASM Handbook Vol. 2, wrought aluminium alloy 7075 (value from memory)',
  },
  {
    name: 'Carbon steel',
    family: 'metal',
    density: 7850,
    densityTolerance: 0.01,
    source: 'Common practice: 7850 kg/m³ for structural carbon steel (EN 1991-1-1 Table A.4 lists 77–78.5 kN/m³)',
  },
  {
    name: 'Stainless steel 304',
    family: 'metal',
    density: 8000,
    densityTolerance: 0.01,
    source: 'ASM Handbook Vol. 1, austenitic stainless 304 (value from memory)',
  },
  {
    name: 'Titanium Ti-6Al-4V',
    family: 'metal',
    density: 4430,
    densityTolerance: 0.01,
    source: 'ASM Handbook Vol. 2, titanium alloy Ti-6Al-4V (value from memory)',
  },
  {
    name: 'Lead',
    family: 'metal',
    density: 11340,
    densityTolerance: 0.005,
    source: 'CRC Handbook of Chemistry and Physics, density of the elements (value from memory)',
  },
  {
    name: 'Carbon/epoxy laminate (60 % fibre)',
    family: 'composite',
    density: 1550,
    densityTolerance: 0.04,
    source: 'Common practice: unidirectional carbon/epoxy at 60 % fibre volume, 1500–1600 kg/m³',
  },
  {
    name: 'Glass/epoxy laminate (55 % fibre)',
    family: 'composite',
    density: 1950,
    densityTolerance: 0.04,
    source: 'Common practice: E-glass/epoxy at about 55 % fibre volume, 1900–2000 kg/m³',
  },
  {
    name: 'Nylon 6/6',
    family: 'polymer',
    density: 1140,
    densityTolerance: 0.02,
    source: 'Common practice: polyamide 6/6 datasheets, 1130–1150 kg/m³',
  },
  { name: 'ABS', family: 'polymer', density: 1050, densityTolerance: 0.02, source: 'Common practice: ABS datasheets, 1030–1070 kg/m³' },
  {
    name: 'Polycarbonate',
    family: 'polymer',
    density: 1200,
    densityTolerance: 0.02,
    source: 'Common practice: polycarbonate datasheets, 1190–1220 kg/m³',
  },
  {
    name: 'EVA foam (medium)',
    family: 'foam',
    density: 100,
    densityTolerance: 0.15,
    source: 'Common practice: closed-cell EVA grips and pads, 60–150 kg/m³',
  },
  {
    name: 'PU foam (moulded)',
    family: 'foam',
    density: 200,
    densityTolerance: 0.15,
    source: 'Common practice: moulded polyurethane foam cores, 100–300 kg/m³',
  },
  {
    name: 'Natural rubber',
    family: 'elastomer',
    density: 1100,
    densityTolerance: 0.05,
    source: 'Common practice: filled natural rubber compounds, 1000–1200 kg/m³',
  },
  {
    name: 'Cork (agglomerated)',
    family: 'natural',
    density: 200,
    densityTolerance: 0.15,
    source: 'Common practice: agglomerated cork, 150–250 kg/m³',
  },
];
