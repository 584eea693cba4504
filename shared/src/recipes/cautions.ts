/**
 * Shown on every edge recipe (common practice at the bench). The last line defers to the people who know the machine
 * and the workplace.
 */
export const BENCH_CAUTIONS: readonly string[] = [
  'Wear a dust mask or run dust extraction: grinding throws fine metal and abrasive dust.',
  'Watch the heat: a blade too hot to touch means lighter pressure and slower work; let the weight of the tool do the work, not downward pressure.',
  "Keep the blade on one side of the disc's centre: crossing it reverses the rotation under the edge.",
  'Fold the burr off by drawing across the edge, never along it.',
  'Keep discs finer than the one in use face down, so airborne grit does not embed in them.',
  'Keep fingers clear of the edge when wiping.',
  "Follow the equipment maker's instructions and local workplace-safety rules.",
];
