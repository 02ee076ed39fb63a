import {
  makeStyles,
  Text,
  Toolbar,
  ToolbarButton,
  ToolbarDivider,
  Tooltip,
  tokens,
} from '@fluentui/react-components';
import { ArrowDownloadRegular, ZoomFitRegular, ZoomInRegular, ZoomOutRegular } from '@fluentui/react-icons';
import type { Drawing, StrokeName } from 'ligament/draw';
import { STROKES } from 'ligament/draw';
import {
  useCallback,
  useEffect,
  useLayoutEffect,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent,
} from 'react';
import { notify } from '@/lib/notify';
import { downloadPng, downloadSvg } from './drawing-files';
import {
  fitScale,
  MIN_TEXT_PX,
  panBy,
  startingView,
  viewBoxOf,
  viewportHeight,
  zoomAt,
  type View,
} from './drawing-view';
import { MemberDrawing, type DrawnChain } from './member-drawing';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, minWidth: 0 },
  viewport: {
    position: 'relative',
    overflow: 'hidden',
    width: '100%',
    borderRadius: tokens.borderRadiusMedium,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: tokens.colorNeutralBackground1,
    cursor: 'grab',
    // A drag pans the sheet; it must not select the labels' text.
    userSelect: 'none',
    // The drawing fills the viewport, which draws the frame.
    '& > svg': { height: '100%', maxHeight: 'none', border: 'none', borderRadius: 0 },
    // Gestures inside the drawing pan and zoom it; the page scrolls from outside it.
    touchAction: 'none',
    ':focus-visible': {
      outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}`,
      outlineOffset: '2px',
    },
  },
  dragging: { cursor: 'grabbing' },
  toolbar: { flexWrap: 'wrap', padding: 0 },
  zoom: { minWidth: '4.5em', textAlign: 'center', color: tokens.colorNeutralForeground2 },
  legend: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexWrap: 'wrap',
    columnGap: tokens.spacingHorizontalL,
    rowGap: tokens.spacingVerticalXS,
  },
  legendItem: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  help: { color: tokens.colorNeutralForeground2 },
});

/** Legend samples in the renderer's colours; dash patterns and the diamond tell them apart without colour. */
const SAMPLE_COLOUR: Partial<Record<StrokeName, string>> = {
  'fracture-minus': tokens.colorPaletteRedForeground1,
  'fracture-plus': tokens.colorPaletteBlueForeground2,
  claimed: tokens.colorPaletteGrapeForeground2,
};

function Sample({ stroke, diamond }: { stroke: StrokeName; diamond?: boolean }) {
  const s = STROKES[stroke];
  // Legend samples are drawn at 4 px per sheet mm, about the size the drawing starts at.
  return (
    <svg width="44" height="16" viewBox="0 0 11 4" aria-hidden>
      <line
        x1="0.3"
        y1="2"
        x2={diamond ? 6.5 : 10.7}
        y2="2"
        stroke={SAMPLE_COLOUR[stroke] ?? tokens.colorNeutralForeground1}
        strokeWidth={s.width}
        strokeDasharray={s.dash?.join(' ')}
      />
      {diamond && (
        <polygon
          points="8.6,0.4 10.2,2 8.6,3.6 7,2"
          fill="none"
          stroke={SAMPLE_COLOUR[stroke]}
          strokeWidth={s.width}
        />
      )}
    </svg>
  );
}

export interface DrawingViewerProps {
  readonly drawing: Drawing;
  readonly chains: readonly DrawnChain[];
  readonly highlighted: string | null;
}

/** Fraction of the view a key press pans, and the zoom step of a button or key. */
const KEY_PAN = 0.1;
const ZOOM_STEP = 1.25;

/**
 * The member drawing in a viewport that zooms (buttons, Ctrl or ⌘ with the wheel, a trackpad or
 * touch pinch, + and − keys) and pans (drag, arrow keys), with a reset, a legend of its lines and
 * downloads as SVG (the `ligament draw` serialiser) and PNG. It starts where every label is at
 * least 11.5 px on screen, and labels never shrink below that as it zooms out.
 */
export function DrawingViewer({ drawing, chains, highlighted }: DrawingViewerProps) {
  const styles = useStyles();
  const viewportRef = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(0);
  // The view the user chose, for the drawing they chose it on; another drawing starts afresh.
  const [chosen, setChosen] = useState<{ readonly drawing: Drawing; readonly view: View } | null>(null);
  const [dragging, setDragging] = useState(false);
  const [saving, setSaving] = useState<'svg' | 'png' | null>(null);
  const pointers = useRef(new Map<number, { x: number; y: number }>());

  useLayoutEffect(() => {
    const element = viewportRef.current;
    if (!element) return;
    const measure = () => setWidth(element.clientWidth);
    measure();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(measure);
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  const start = useMemo(() => (width > 0 ? startingView(drawing, width) : null), [drawing, width]);
  // Showing the whole sheet, the viewport is as tall as the sheet; zoomed in from the start (a narrow
  // screen), at most three quarters of the window, so the page around it can still be reached.
  const wholeSheet = start !== null && start.scale <= fitScale(drawing, width) + 1e-9;
  const height = start
    ? viewportHeight(drawing, start, wholeSheet ? Infinity : window.innerHeight * 0.75)
    : 0;
  const own = chosen?.drawing === drawing ? chosen.view : null;
  const view = own ?? start;

  const apply = useCallback(
    (change: (current: View) => View) => {
      if (!start) return;
      setChosen((current) => ({
        drawing,
        view: change(current?.drawing === drawing ? current.view : start),
      }));
    },
    [start, drawing],
  );
  const zoom = (factor: number, px = width / 2, py = height / 2) =>
    apply((v) => zoomAt(v, factor, px, py, drawing, width, height));

  // Ctrl/⌘ + wheel and trackpad pinches (which arrive as wheel events with ctrlKey) zoom at the
  // pointer; a plain wheel scrolls the page. A listener of our own: React's wheel listener is passive.
  useEffect(() => {
    const element = viewportRef.current;
    if (!element) return;
    const onWheel = (event: WheelEvent) => {
      if (!event.ctrlKey && !event.metaKey) return;
      event.preventDefault();
      const box = element.getBoundingClientRect();
      const factor = Math.exp(-event.deltaY * 0.002);
      apply((v) =>
        zoomAt(v, factor, event.clientX - box.left, event.clientY - box.top, drawing, width, height),
      );
    };
    element.addEventListener('wheel', onWheel, { passive: false });
    return () => element.removeEventListener('wheel', onWheel);
  }, [apply, drawing, width, height]);

  const onPointerDown = (event: React.PointerEvent<HTMLDivElement>) => {
    if (event.pointerType === 'mouse' && event.button !== 0) return;
    event.currentTarget.setPointerCapture(event.pointerId);
    pointers.current.set(event.pointerId, { x: event.clientX, y: event.clientY });
    setDragging(true);
  };
  const onPointerMove = (event: React.PointerEvent<HTMLDivElement>) => {
    const last = pointers.current.get(event.pointerId);
    if (!last) return;
    const now = { x: event.clientX, y: event.clientY };
    const others = [...pointers.current.entries()].filter(([id]) => id !== event.pointerId);
    const other = others[0]?.[1];
    if (other) {
      // Two fingers: zoom by the change in their distance, about their midpoint.
      const before = Math.hypot(last.x - other.x, last.y - other.y);
      const after = Math.hypot(now.x - other.x, now.y - other.y);
      const box = event.currentTarget.getBoundingClientRect();
      const mx = (now.x + other.x) / 2 - box.left;
      const my = (now.y + other.y) / 2 - box.top;
      if (before > 0) apply((v) => zoomAt(v, after / before, mx, my, drawing, width, height));
    } else {
      apply((v) => panBy(v, now.x - last.x, now.y - last.y, drawing, width, height));
    }
    pointers.current.set(event.pointerId, now);
  };
  const onPointerUp = (event: React.PointerEvent<HTMLDivElement>) => {
    pointers.current.delete(event.pointerId);
    if (pointers.current.size === 0) setDragging(false);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const step = { x: width * KEY_PAN, y: height * KEY_PAN };
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [step.x, 0],
      ArrowRight: [-step.x, 0],
      ArrowUp: [0, step.y],
      ArrowDown: [0, -step.y],
    };
    const move = moves[event.key];
    if (move) apply((v) => panBy(v, move[0], move[1], drawing, width, height));
    else if (event.key === '+' || event.key === '=') zoom(ZOOM_STEP);
    else if (event.key === '-' || event.key === '_') zoom(1 / ZOOM_STEP);
    else if (event.key === '0') setChosen(null);
    else return;
    event.preventDefault();
  };

  const save = (kind: 'svg' | 'png') => {
    setSaving(kind);
    Promise.resolve(kind === 'svg' ? downloadSvg(drawing) : downloadPng(drawing))
      .catch((error: unknown) =>
        notify({
          intent: 'error',
          title: `The ${kind.toUpperCase()} could not be made`,
          body: error instanceof Error ? error.message : String(error),
        }),
      )
      .finally(() => setSaving(null));
  };

  const strokes = new Set(
    drawing.shapes.flatMap((s) => (s.kind === 'fracture' || s.kind === 'claimed-chain' ? [s.stroke] : [])),
  );
  const percent = view && start ? Math.round((view.scale / start.scale) * 100) : 100;

  return (
    <div className={styles.root}>
      <Toolbar aria-label={`Drawing of ${drawing.memberId}`} size="small" className={styles.toolbar}>
        <Tooltip content="Zoom in (+)" relationship="label">
          <ToolbarButton icon={<ZoomInRegular />} onClick={() => zoom(ZOOM_STEP)} />
        </Tooltip>
        <Text size={200} className={styles.zoom} aria-live="polite" data-testid="drawing-zoom">
          {percent} %
        </Text>
        <Tooltip content="Zoom out (−)" relationship="label">
          <ToolbarButton icon={<ZoomOutRegular />} onClick={() => zoom(1 / ZOOM_STEP)} />
        </Tooltip>
        <ToolbarButton icon={<ZoomFitRegular />} onClick={() => setChosen(null)} disabled={own === null}>
          Reset view
        </ToolbarButton>
        <ToolbarDivider />
        <ToolbarButton icon={<ArrowDownloadRegular />} onClick={() => save('svg')} disabled={saving !== null}>
          Download SVG
        </ToolbarButton>
        <ToolbarButton icon={<ArrowDownloadRegular />} onClick={() => save('png')} disabled={saving !== null}>
          Download PNG
        </ToolbarButton>
      </Toolbar>
      <div
        ref={viewportRef}
        className={dragging ? `${styles.viewport} ${styles.dragging}` : styles.viewport}
        style={height > 0 ? { height } : undefined}
        role="group"
        aria-roledescription="zoomable drawing"
        aria-label={`${drawing.title}. Drag or use the arrow keys to pan; + and − zoom, 0 resets.`}
        tabIndex={0}
        onKeyDown={onKeyDown}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
        onPointerCancel={onPointerUp}
        data-testid="drawing-viewport"
      >
        <MemberDrawing
          drawing={drawing}
          chains={chains}
          highlighted={highlighted}
          viewBox={view ? viewBoxOf(view, width, height) : undefined}
          minTextSize={view ? MIN_TEXT_PX / view.scale : 0}
        />
      </div>
      <ul className={styles.legend} aria-label="Lines on the drawing">
        {strokes.has('fracture-minus') && (
          <li className={styles.legendItem}>
            <Sample stroke="fracture-minus" />
            <Text size={200}>Governing fracture line, load from −x (dashed; recomputed)</Text>
          </li>
        )}
        {strokes.has('fracture-plus') && (
          <li className={styles.legendItem}>
            <Sample stroke="fracture-plus" />
            <Text size={200}>Governing fracture line, load from +x (dotted; recomputed)</Text>
          </li>
        )}
        {strokes.has('claimed') && (
          <li className={styles.legendItem}>
            <Sample stroke="claimed" diamond />
            <Text size={200}>Chain the calc file claims controls (solid, diamonds at its holes)</Text>
          </li>
        )}
      </ul>
      <Text size={200} className={styles.help}>
        Drag to pan; hold Ctrl (⌘ on a Mac) and scroll, or pinch, to zoom; with the drawing focused, arrow
        keys pan, + and − zoom and 0 resets. Point at a chain in the tables below to trace it on the plate.
      </Text>
    </div>
  );
}
