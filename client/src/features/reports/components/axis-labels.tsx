interface TickProps {
  x?: number | string;
  y?: number | string;
  payload?: { value?: string | number };
}

/**
 * A horizontal bar chart's names on its y axis: wide enough for a stop's name on a desk, a short form on a phone.
 * Drawn as one plain line (recharts would wrap a long name onto two, over the next bar's name).
 */
export function nameAxis(phone: boolean) {
  const letters = phone ? 15 : 30;
  const fontSize = phone ? 11 : 12;
  return {
    width: phone ? 112 : 220,
    interval: 0 as const,
    tick: ({ x, y, payload }: TickProps) => {
      const name = String(payload?.value ?? '');
      return (
        <text x={x} y={y} dy={4} dx={-6} textAnchor="end" fontSize={fontSize} fill="var(--chart-text-color, #797167)">
          <title>{name}</title>
          {name.length > letters ? `${name.slice(0, letters - 1)}…` : name}
        </text>
      );
    },
  };
}
