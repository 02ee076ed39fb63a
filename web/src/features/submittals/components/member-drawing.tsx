import { makeStyles, tokens } from '@fluentui/react-components';
import type { Drawing, Point, Shape, StrokeName, TextShape } from 'ligament/draw';
import { arrowHead, chainPoints, slotPath, STROKES } from 'ligament/draw';
import { chainKey } from '@/lib/units';

const useStyles = makeStyles({
  svg: {
    display: 'block',
    width: '100%',
    height: 'auto',
    maxHeight: '460px',
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusMedium,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
  },
});

/** Stroke colours as theme tokens (the model's own hex colours are for the standalone SVG file). */
const strokeColour: Record<StrokeName, string> = {
  frame: tokens.colorNeutralStroke1,
  outline: tokens.colorNeutralForeground1,
  hole: tokens.colorNeutralForeground1,
  centre: tokens.colorNeutralForeground3,
  extension: tokens.colorNeutralForeground2,
  dimension: tokens.colorNeutralForeground2,
  tick: tokens.colorNeutralForeground1,
  load: tokens.colorNeutralForeground1,
  'fracture-minus': tokens.colorPaletteRedForeground1,
  'fracture-plus': tokens.colorPaletteBlueForeground2,
  claimed: tokens.colorPaletteGrapeForeground2,
  leader: tokens.colorNeutralForeground2,
};

const textColour = (t: TextShape): string => {
  if (t.role === 'caution' || t.role === 'title-detail' || t.role === 'dimension')
    return tokens.colorNeutralForeground2;
  return tokens.colorNeutralForeground1;
};

function strokeProps(name: StrokeName, widthFactor = 1) {
  const s = STROKES[name];
  return {
    stroke: strokeColour[name],
    strokeWidth: s.width * widthFactor,
    strokeDasharray: s.dash ? s.dash.join(' ') : undefined,
    fill: 'none',
    strokeLinecap: 'round' as const,
    strokeLinejoin: 'round' as const,
  };
}

const pts = (points: readonly Point[]) => points.map(([x, y]) => `${x},${y}`).join(' ');

/**
 * `minSize`: the least font size in sheet millimetres, so that no label is smaller on screen than
 * the viewer allows at its zoom (a label keeps its anchor and grows away from it).
 */
function TextEl({ t, colour, minSize = 0 }: { t: TextShape; colour?: string; minSize?: number }) {
  return (
    <text
      x={t.at[0]}
      y={t.at[1]}
      fontSize={Math.max(t.size, minSize)}
      textAnchor={t.anchor}
      fill={colour ?? textColour(t)}
      fontWeight={t.weight === 'bold' ? 600 : undefined}
      fontStyle={t.italic ? 'italic' : undefined}
      transform={t.rotate ? `rotate(${t.rotate} ${t.at[0]} ${t.at[1]})` : undefined}
    >
      {t.text}
    </text>
  );
}

/** A chain to light up: its direction and hole ids in y order. */
export interface DrawnChain {
  readonly direction: string;
  readonly holes: readonly string[];
}

export interface MemberDrawingProps {
  readonly drawing: Drawing;
  /** Every chain the tables list, so any of them can be highlighted. */
  readonly chains: readonly DrawnChain[];
  /** chainKey(direction, holes) of the chain to highlight, or null. */
  readonly highlighted: string | null;
  /** The part of the sheet to show (sheet mm); the whole sheet by default. */
  readonly viewBox?: string;
  /** The least font size, sheet mm (the viewer's on-screen minimum at its zoom). */
  readonly minTextSize?: number;
}

/**
 * Renders the shared drawing model (ligament/draw) as SVG with the theme's colours: the plate to
 * scale, holes and slots, gauge and pitch dimensions, load arrows and the governing fracture line
 * of each direction. The chain highlighted in the table is drawn over it, edge to holes to edge.
 */
export function MemberDrawing({
  drawing,
  chains,
  highlighted,
  viewBox,
  minTextSize = 0,
}: MemberDrawingProps) {
  const styles = useStyles();
  const lit = chains.find((c) => chainKey(c.direction, c.holes) === highlighted);
  const litHoles = new Set(lit?.holes ?? []);
  const litPoints = lit && lit.holes.length > 0 ? chainPoints(drawing, lit.holes) : null;

  const render = (s: Shape, index: number) => {
    switch (s.kind) {
      case 'rect':
        return (
          <rect
            key={index}
            x={s.at[0]}
            y={s.at[1]}
            width={s.width}
            height={s.height}
            {...strokeProps(s.stroke)}
          />
        );
      case 'line':
        return (
          <line
            key={index}
            x1={s.from[0]}
            y1={s.from[1]}
            x2={s.to[0]}
            y2={s.to[1]}
            {...strokeProps(s.stroke)}
          />
        );
      case 'polyline':
        return s.closed ? (
          <polygon
            key={index}
            points={pts(s.points)}
            {...strokeProps(s.stroke)}
            fill={s.stroke === 'outline' ? tokens.colorNeutralBackground3 : 'none'}
          />
        ) : (
          <polyline key={index} points={pts(s.points)} {...strokeProps(s.stroke)} />
        );
      case 'circle':
        return (
          <circle
            key={index}
            cx={s.centre[0]}
            cy={s.centre[1]}
            r={s.radius}
            {...strokeProps(s.stroke, litHoles.has(s.holeId) ? 2 : 1)}
            fill={litHoles.has(s.holeId) ? tokens.colorBrandBackground2 : tokens.colorNeutralBackground1}
            data-hole={s.holeId}
          />
        );
      case 'slot':
        return (
          <path
            key={index}
            d={slotPath(s.centre, s.along, s.across)}
            {...strokeProps(s.stroke, litHoles.has(s.holeId) ? 2 : 1)}
            fill={litHoles.has(s.holeId) ? tokens.colorBrandBackground2 : tokens.colorNeutralBackground1}
            data-hole={s.holeId}
          />
        );
      case 'dimension':
        return (
          <g key={index} data-dimension={s.measure}>
            {s.extensions.map((e, i) => (
              <line
                key={i}
                x1={e.from[0]}
                y1={e.from[1]}
                x2={e.to[0]}
                y2={e.to[1]}
                {...strokeProps('extension')}
              />
            ))}
            <line
              x1={s.line.from[0]}
              y1={s.line.from[1]}
              x2={s.line.to[0]}
              y2={s.line.to[1]}
              {...strokeProps('dimension')}
            />
            {s.ticks.map((t, i) => (
              <line
                key={`t${i}`}
                x1={t.from[0]}
                y1={t.from[1]}
                x2={t.to[0]}
                y2={t.to[1]}
                {...strokeProps('tick')}
              />
            ))}
            <TextEl t={s.label} minSize={minTextSize} />
          </g>
        );
      case 'arrow':
        return (
          <g key={index} data-load={s.direction}>
            <line x1={s.tail[0]} y1={s.tail[1]} x2={s.head[0]} y2={s.head[1]} {...strokeProps(s.stroke)} />
            <polygon
              points={pts(arrowHead(s.tail, s.head, s.headLength, s.headWidth))}
              fill={strokeColour[s.stroke]}
            />
          </g>
        );
      case 'fracture':
        return (
          <g
            key={index}
            data-fracture={s.directions.join(' ')}
            data-chain={s.holes.join(' ')}
            opacity={lit ? 0.35 : 1}
          >
            <polyline points={pts(s.points)} {...strokeProps(s.stroke)} />
            <line
              x1={s.leader.from[0]}
              y1={s.leader.from[1]}
              x2={s.leader.to[0]}
              y2={s.leader.to[1]}
              {...strokeProps('leader')}
            />
            <TextEl t={s.label} colour={strokeColour[s.stroke]} minSize={minTextSize} />
          </g>
        );
      case 'claimed-chain':
        return (
          <g
            key={index}
            data-claimed-chain={s.holes.join(' ')}
            data-direction={s.direction}
            opacity={lit ? 0.35 : 1}
          >
            {s.points.length > 1 && <polyline points={pts(s.points)} {...strokeProps(s.stroke)} />}
            {s.markers.map((m, i) => (
              <polygon key={i} points={pts(m)} {...strokeProps(s.stroke)} />
            ))}
            {s.leader && (
              <line
                x1={s.leader.from[0]}
                y1={s.leader.from[1]}
                x2={s.leader.to[0]}
                y2={s.leader.to[1]}
                {...strokeProps('leader')}
              />
            )}
            <TextEl t={s.label} colour={strokeColour[s.stroke]} minSize={minTextSize} />
          </g>
        );
      case 'text':
        return <TextEl key={index} t={s} minSize={minTextSize} />;
    }
  };

  return (
    <svg
      className={styles.svg}
      viewBox={viewBox ?? `0 0 ${drawing.width} ${drawing.height}`}
      role="img"
      aria-label={drawing.title}
      fontFamily={tokens.fontFamilyBase}
      data-testid="member-drawing"
    >
      <title>{drawing.title}</title>
      {drawing.shapes.map(render)}
      {litPoints && (
        <polyline
          points={pts(litPoints)}
          stroke={tokens.colorBrandForeground1}
          strokeWidth={1.1}
          fill="none"
          strokeLinejoin="round"
          strokeLinecap="round"
          data-highlighted-chain={lit?.holes.join(' ')}
        />
      )}
    </svg>
  );
}
