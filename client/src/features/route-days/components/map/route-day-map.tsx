import { useId } from 'react';
import type { Place, RouteDayStop } from '../../types';
import { fitToBox, projectKm, scaleBar } from './projection';

const WIDTH = 240;
const HEIGHT = 150;
const PADDING = 16;
const MARKER = 9;
const TEAL = 'var(--mantine-color-keenTeal-6)';
const BRASS = 'var(--mantine-color-brass-6)';

interface RouteDayMapProps {
  start: Place;
  stops: readonly Pick<RouteDayStop, 'stopId' | 'position' | 'name' | 'latitude' | 'longitude'>[];
  /** Names the map for screen readers, e.g. "Tuesday, Mar 4 with Sasha Hone". */
  label: string;
}

/** The day's places on a plain map: the base as a square, the stops numbered in order, the drive as one line. */
export function RouteDayMap({ start, stops, label }: RouteDayMapProps) {
  const titleId = useId();
  const fitted = fitToBox(projectKm([start, ...stops]), WIDTH, HEIGHT, PADDING);
  const [base, ...stopPoints] = fitted.points;
  if (!base) return null;
  const route = [base, ...stopPoints, base].map((point) => `${point.x.toFixed(1)},${point.y.toFixed(1)}`).join(' ');
  const bar = scaleBar(fitted.unitsPerKm, WIDTH / 3);
  const barY = HEIGHT - 8;

  return (
    <svg
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      role="img"
      aria-labelledby={titleId}
      style={{
        width: '100%',
        height: 'auto',
        display: 'block',
        background: 'var(--mantine-color-gray-0)',
        borderRadius: 8,
      }}
    >
      <title id={titleId}>{`Map of ${label}: ${stops.length} ${stops.length === 1 ? 'stop' : 'stops'}`}</title>
      <polyline points={route} fill="none" stroke={TEAL} strokeWidth={2} strokeLinejoin="round" opacity={0.7} />
      <g>
        <title>{`Base: ${start.label}`}</title>
        <rect
          x={base.x - MARKER}
          y={base.y - MARKER}
          width={MARKER * 2}
          height={MARKER * 2}
          rx={3}
          fill={BRASS}
          stroke="white"
          strokeWidth={2}
        />
        <text x={base.x} y={base.y + 4} textAnchor="middle" fontSize={10} fontWeight={700} fill="white">
          B
        </text>
      </g>
      {stops.map((stop, index) => {
        const point = stopPoints[index];
        if (!point) return null;
        return (
          <g key={stop.stopId}>
            <title>{`${index + 1}. ${stop.name}`}</title>
            <circle cx={point.x} cy={point.y} r={MARKER} fill={TEAL} stroke="white" strokeWidth={2} />
            <text x={point.x} y={point.y + 4} textAnchor="middle" fontSize={10} fontWeight={700} fill="white">
              {index + 1}
            </text>
          </g>
        );
      })}
      {bar.km > 0 ? (
        <g aria-hidden="true">
          <line x1={8} y1={barY} x2={8 + bar.length} y2={barY} stroke="var(--mantine-color-gray-8)" strokeWidth={2} />
          <line x1={8} y1={barY - 4} x2={8} y2={barY} stroke="var(--mantine-color-gray-8)" strokeWidth={2} />
          <line
            x1={8 + bar.length}
            y1={barY - 4}
            x2={8 + bar.length}
            y2={barY}
            stroke="var(--mantine-color-gray-8)"
            strokeWidth={2}
          />
          <text x={8} y={barY - 7} fontSize={10} fill="var(--mantine-color-gray-8)" data-testid="scale-label">
            {bar.label}
          </text>
        </g>
      ) : null}
    </svg>
  );
}
