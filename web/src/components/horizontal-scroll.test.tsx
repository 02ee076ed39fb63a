import { fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, onTestFinished, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { HorizontalScroll } from './horizontal-scroll';

/** jsdom lays nothing out: give the region the sizes a browser would. */
function layout(scrollWidth: number, clientWidth: number, scrollLeft = 0) {
  vi.spyOn(HTMLElement.prototype, 'scrollWidth', 'get').mockReturnValue(scrollWidth);
  vi.spyOn(HTMLElement.prototype, 'clientWidth', 'get').mockReturnValue(clientWidth);
  vi.spyOn(HTMLElement.prototype, 'scrollLeft', 'get').mockReturnValue(scrollLeft);
}

afterEach(() => vi.restoreAllMocks());

describe('HorizontalScroll', () => {
  it('is a named region without a tab stop or cue while its content fits', () => {
    layout(300, 300);
    renderWithProviders(
      <HorizontalScroll label="Calc files" buttons>
        <p>tabs</p>
      </HorizontalScroll>,
    );
    const region = screen.getByRole('region', { name: 'Calc files' });
    expect(region).not.toHaveAttribute('tabindex');
    expect(screen.queryByRole('button')).toBeNull();
  });

  it('takes focus and shows an arrow on the side that has more, and scrolls by it', () => {
    layout(900, 300, 0);
    const scrollBy = vi.fn();
    // jsdom has no scrollBy; the stand-in is removed after the test.
    HTMLElement.prototype.scrollBy = scrollBy;
    onTestFinished(() => {
      delete (HTMLElement.prototype as Partial<HTMLElement>).scrollBy;
    });
    renderWithProviders(
      <HorizontalScroll label="Calc files" buttons>
        <p>tabs</p>
      </HorizontalScroll>,
    );
    const region = screen.getByRole('region', { name: 'Calc files' });
    expect(region).toHaveAttribute('tabindex', '0');
    expect(screen.queryByRole('button', { name: 'Calc files: scroll left' })).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Calc files: scroll right' }));
    expect(scrollBy).toHaveBeenCalledWith({ left: 240, behavior: 'smooth' });
    // Scrolled to the end: the arrow moves to the other side.
    vi.spyOn(HTMLElement.prototype, 'scrollLeft', 'get').mockReturnValue(600);
    fireEvent.scroll(region);
    expect(screen.getByRole('button', { name: 'Calc files: scroll left' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Calc files: scroll right' })).toBeNull();
  });
});
