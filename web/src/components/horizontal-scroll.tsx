import { Button, makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { ChevronLeftRegular, ChevronRightRegular } from '@fluentui/react-icons';
import { useCallback, useLayoutEffect, useRef, useState, type CSSProperties, type ReactNode } from 'react';

const useStyles = makeStyles({
  outer: { position: 'relative', minWidth: 0 },
  inner: {
    overflowX: 'auto',
    overscrollBehaviorX: 'contain',
    ':focus-visible': {
      outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}`,
      outlineOffset: '2px',
    },
  },
  // A table keeps a readable width (`minWidth`) and scrolls rather than squeezing its columns.
  minWidth: { '& > table': { minWidth: 'var(--ligament-scroll-min-width)' } },
  // With buttons, the scrollbar would sit under the tabs' selection bar: the buttons and fades do its job.
  noScrollbar: { scrollbarWidth: 'none', '::-webkit-scrollbar': { display: 'none' } },
  fade: {
    position: 'absolute',
    top: 0,
    bottom: 0,
    width: '40px',
    pointerEvents: 'none',
    zIndex: 1,
  },
  fadeStart: {
    left: 0,
    backgroundImage: `linear-gradient(to right, ${tokens.colorNeutralBackground1}, transparent)`,
  },
  fadeEnd: {
    right: 0,
    backgroundImage: `linear-gradient(to left, ${tokens.colorNeutralBackground1}, transparent)`,
  },
  button: {
    position: 'absolute',
    top: '50%',
    transform: 'translateY(-50%)',
    zIndex: 2,
    backgroundColor: tokens.colorNeutralBackground1,
    boxShadow: tokens.shadow4,
  },
  buttonStart: { left: 0 },
  buttonEnd: { right: 0 },
});

/** The arrow buttons: one for each side that has more to show. */
const SIDES = [
  { side: 'before', step: -1, icon: <ChevronLeftRegular />, words: 'left' },
  { side: 'after', step: 1, icon: <ChevronRightRegular />, words: 'right' },
] as const;

export interface HorizontalScrollProps {
  /** Names the scrolling region for screen readers (it is focusable while it overflows). */
  readonly label: string;
  readonly children: ReactNode;
  /** Arrow buttons at an edge with more beyond it (for tab lists, which a mouse cannot scroll sideways). */
  readonly buttons?: boolean;
  readonly className?: string;
  /** The least width of a table inside (CSS length), below which it scrolls instead of squeezing. */
  readonly minWidth?: string;
}

/**
 * Content wider than the screen (a table, a row of tabs) scrolls sideways inside a labelled region
 * instead of running off the page; a fade, and with `buttons` an arrow, marks each side that has more.
 * While it overflows the region takes keyboard focus, so arrow keys scroll it.
 */
export function HorizontalScroll({ label, children, buttons, className, minWidth }: HorizontalScrollProps) {
  const styles = useStyles();
  const ref = useRef<HTMLDivElement>(null);
  const [more, setMore] = useState({ before: false, after: false });

  const measure = useCallback(() => {
    const el = ref.current;
    if (!el) return;
    const before = el.scrollLeft > 1;
    const after = el.scrollLeft + el.clientWidth < el.scrollWidth - 1;
    setMore((m) => (m.before === before && m.after === after ? m : { before, after }));
  }, []);

  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    measure();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    for (const child of Array.from(el.children)) observer.observe(child);
    return () => observer.disconnect();
  }, [measure]);

  const scroll = (direction: 1 | -1) => {
    const el = ref.current;
    el?.scrollBy({ left: direction * el.clientWidth * 0.8, behavior: 'smooth' });
  };
  const overflowing = more.before || more.after;

  return (
    <div
      className={mergeClasses(styles.outer, className)}
      data-more-before={more.before || undefined}
      data-more-after={more.after || undefined}
    >
      <div
        ref={ref}
        className={mergeClasses(styles.inner, buttons && styles.noScrollbar, minWidth && styles.minWidth)}
        style={minWidth ? ({ '--ligament-scroll-min-width': minWidth } as CSSProperties) : undefined}
        role="region"
        aria-label={label}
        tabIndex={overflowing ? 0 : undefined}
        onScroll={measure}
        // Keyboard focus moving along (tabs under arrow keys) brings the focused item into view
        // (jsdom, which the unit tests run in, has no scrollIntoView).
        onFocus={(event) => {
          if (event.target !== event.currentTarget)
            event.target.scrollIntoView?.({ block: 'nearest', inline: 'nearest' });
        }}
      >
        {children}
      </div>
      {more.before && <span className={mergeClasses(styles.fade, styles.fadeStart)} aria-hidden />}
      {more.after && <span className={mergeClasses(styles.fade, styles.fadeEnd)} aria-hidden />}
      {buttons &&
        SIDES.filter(({ side }) => more[side]).map(({ side, step, icon, words }) => (
          <Button
            key={side}
            className={mergeClasses(styles.button, side === 'before' ? styles.buttonStart : styles.buttonEnd)}
            size="small"
            shape="circular"
            icon={icon}
            aria-label={`${label}: scroll ${words}`}
            tabIndex={-1}
            onClick={() => scroll(step)}
          />
        ))}
    </div>
  );
}
