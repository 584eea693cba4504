/** The figures the benchmarks print: one decimal, and the median of a list of timings. */
export const round1 = (value: number) => Math.round(value * 10) / 10;
export const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
