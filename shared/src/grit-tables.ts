/** The grading systems Keenroute converts between. */
export const GRIT_SCALES = ['fepa-p', 'fepa-f', 'jis'] as const;
export type GritScale = (typeof GRIT_SCALES)[number];

/** One band of a published grade table: the grade number and its size in micrometres. */
export interface GritTablePart {
  /** The standard the values are taken from. */
  standard: string;
  /** What the micrometre figure is (median of a sedimentation test, or the usual average of a sieve grade). */
  measure: string;
  /** [grade number, size in µm], coarse to fine. */
  rows: readonly (readonly [number, number])[];
}

export interface GritScaleTable {
  scale: GritScale;
  name: string;
  /** How a grade is written: "P240", "F230", "#6000". */
  prefix: string;
  parts: readonly GritTablePart[];
}

// Typed from the published tables as remembered, not copied from a copy at hand: docs/trade-rules.md says so.
export const GRIT_TABLES: Readonly<Record<GritScale, GritScaleTable>> = {
  'fepa-p': {
    scale: 'fepa-p',
    name: 'FEPA P (coated abrasives)',
    prefix: 'P',
    parts: [
      {
        standard: 'ISO 6344-2 / FEPA 43-1 (macrogrits P12 to P220)',
        measure: 'usual average particle diameter of the sieve grade',
        rows: [
          [12, 1815],
          [16, 1324],
          [20, 1000],
          [24, 764],
          [30, 642],
          [36, 538],
          [40, 425],
          [50, 336],
          [60, 269],
          [80, 201],
          [100, 162],
          [120, 125],
          [150, 100],
          [180, 82],
          [220, 68],
        ],
      },
      {
        standard: 'ISO 6344-3 / FEPA 43-2 (microgrits P240 to P2500)',
        measure: 'median diameter ds50',
        rows: [
          [240, 58.5],
          [280, 52.2],
          [320, 46.2],
          [360, 40.5],
          [400, 35.0],
          [500, 30.2],
          [600, 25.8],
          [800, 21.8],
          [1000, 18.3],
          [1200, 15.3],
          [1500, 12.6],
          [2000, 10.3],
          [2500, 8.4],
        ],
      },
    ],
  },
  'fepa-f': {
    scale: 'fepa-f',
    name: 'FEPA F (bonded abrasives)',
    prefix: 'F',
    parts: [
      {
        standard: 'FEPA 42-1 / ISO 8486-1 (macrogrits F4 to F220)',
        measure: 'usual average particle diameter of the sieve grade',
        rows: [
          [4, 4890],
          [5, 4125],
          [6, 3460],
          [7, 2900],
          [8, 2460],
          [10, 2085],
          [12, 1765],
          [14, 1470],
          [16, 1230],
          [20, 1040],
          [22, 885],
          [24, 745],
          [30, 625],
          [36, 525],
          [40, 438],
          [46, 370],
          [54, 310],
          [60, 260],
          [70, 218],
          [80, 185],
          [90, 154],
          [100, 129],
          [120, 109],
          [150, 82],
          [180, 69],
          [220, 58],
        ],
      },
      {
        standard: 'FEPA 42-2 / ISO 8486-2 (microgrits F230 to F2000)',
        measure: 'median diameter ds50 (sedimentation)',
        rows: [
          [230, 53.0],
          [240, 44.5],
          [280, 36.5],
          [320, 29.2],
          [360, 22.8],
          [400, 17.3],
          [500, 12.8],
          [600, 9.3],
          [800, 6.5],
          [1000, 4.5],
          [1200, 3.0],
          [1500, 2.0],
          [2000, 1.2],
        ],
      },
    ],
  },
  jis: {
    scale: 'jis',
    name: 'JIS (Japanese stones)',
    prefix: '#',
    parts: [
      {
        standard: 'JIS R6001 (microgrits #240 to #8000)',
        measure: 'median diameter ds50 (electrical resistance test)',
        rows: [
          [240, 57.0],
          [280, 48.0],
          [320, 40.0],
          [360, 35.0],
          [400, 30.0],
          [500, 25.0],
          [600, 20.0],
          [700, 17.0],
          [800, 14.0],
          [1000, 11.5],
          [1200, 9.5],
          [1500, 8.0],
          [2000, 6.7],
          [2500, 5.5],
          [3000, 4.0],
          [4000, 3.0],
          [6000, 2.0],
          [8000, 1.2],
        ],
      },
    ],
  },
};
