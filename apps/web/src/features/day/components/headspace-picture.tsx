import type { Headspace } from '@jarday/rules';
import Box from '@mui/material/Box';

/** Drawing units per inch: every headspace is drawn at this one scale, so 1/4 in and 1 in compare by eye. */
export const UNITS_PER_INCH = 160;
const WIDTH = 320;
const TOP = 36;
const GLASS = 14;
const NECK_LEFT = 70;
const NECK_RIGHT = 250;

/**
 * The recipe's headspace (as the load's plan gives it, in inches, millimetres and words) as a picture to match by eye: the top of a jar's neck, cut through, with the food line
 * drawn the headspace below the rim, to scale, and a ruler in eighths of an inch beside it.
 */
export function HeadspacePicture({ headspace }: { headspace: Headspace }) {
  const gap = headspace.inches * UNITS_PER_INCH;
  const food = TOP + gap;
  const height = food + 90;
  const eighths = Math.ceil((gap + 60) / (UNITS_PER_INCH / 8));
  return (
    <Box sx={{ color: 'text.primary', width: '100%', maxWidth: 300 }}>
      <svg
        viewBox={`0 0 ${WIDTH} ${height}`}
        width="100%"
        role="img"
        aria-label={`Headspace ${headspace.label}: the food stops this far below the rim`}
        data-testid="headspace-picture"
        data-units-per-inch={UNITS_PER_INCH}
      >
        {/* Food, up to the line. */}
        <rect
          x={NECK_LEFT + GLASS}
          y={food}
          width={NECK_RIGHT - NECK_LEFT - 2 * GLASS}
          height={height - food}
          fill="#C8702A"
          opacity={0.85}
        />
        <line
          x1={NECK_LEFT + GLASS}
          x2={NECK_RIGHT - GLASS}
          y1={food}
          y2={food}
          stroke="currentColor"
          strokeWidth={3}
        />
        {/* The glass neck, with the threads the band turns on. */}
        <rect
          x={NECK_LEFT}
          y={TOP}
          width={GLASS}
          height={height - TOP}
          fill="#7FC4BC"
          stroke="currentColor"
          strokeWidth={2}
        />
        <rect
          x={NECK_RIGHT - GLASS}
          y={TOP}
          width={GLASS}
          height={height - TOP}
          fill="#7FC4BC"
          stroke="currentColor"
          strokeWidth={2}
        />
        {[0, 1, 2].map((i) => (
          <g key={i} stroke="currentColor" strokeWidth={3}>
            <line x1={NECK_LEFT - 10} x2={NECK_LEFT} y1={TOP + 14 + i * 22} y2={TOP + 8 + i * 22} />
            <line x1={NECK_RIGHT} x2={NECK_RIGHT + 10} y1={TOP + 8 + i * 22} y2={TOP + 14 + i * 22} />
          </g>
        ))}
        <line
          x1={NECK_LEFT - 16}
          x2={NECK_RIGHT + 16}
          y1={TOP}
          y2={TOP}
          stroke="currentColor"
          strokeWidth={2}
          strokeDasharray="6 5"
        />
        {/* The gap itself, measured. */}
        <rect
          data-testid="headspace-gap"
          x={NECK_LEFT + GLASS}
          y={TOP}
          width={NECK_RIGHT - NECK_LEFT - 2 * GLASS}
          height={gap}
          fill="currentColor"
          opacity={0.08}
        />
        <line
          x1={160}
          x2={160}
          y1={TOP + 3}
          y2={food - 3}
          stroke="currentColor"
          strokeWidth={3}
          markerStart="url(#hs-arrow)"
          markerEnd="url(#hs-arrow)"
        />
        <defs>
          <marker
            id="hs-arrow"
            viewBox="0 0 10 10"
            refX="5"
            refY="5"
            markerWidth="5"
            markerHeight="5"
            orient="auto-start-reverse"
          >
            <path d="M 0 0 L 10 5 L 0 10 z" fill="currentColor" />
          </marker>
        </defs>
        {/* A ruler in eighths of an inch, zero at the rim. */}
        <g stroke="currentColor" data-testid="headspace-ruler">
          {Array.from({ length: eighths + 1 }, (_, i) => (
            <line
              key={i}
              x1={WIDTH - 24}
              x2={WIDTH - (i % 8 === 0 ? 4 : i % 2 === 0 ? 12 : 17)}
              y1={TOP + (i * UNITS_PER_INCH) / 8}
              y2={TOP + (i * UNITS_PER_INCH) / 8}
              strokeWidth={i % 2 === 0 ? 2 : 1}
            />
          ))}
        </g>
        <text x={8} y={24} fill="currentColor" fontSize={20} fontWeight={700}>
          rim
        </text>
      </svg>
      <Box sx={{ fontSize: '1.5rem', fontWeight: 700, textAlign: 'center' }}>{headspace.label}</Box>
    </Box>
  );
}
