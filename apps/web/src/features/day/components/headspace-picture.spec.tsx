import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { headspaceOf } from '@jarday/rules';
import { HeadspacePicture, UNITS_PER_INCH } from './headspace-picture';

const gapHeight = () => Number(screen.getByTestId('headspace-gap').getAttribute('height'));

describe('the headspace picture', () => {
  it('draws jam’s 1/4 in gap to scale and labels it in inches and millimetres (USDA Guide 7)', () => {
    render(<HeadspacePicture headspace={headspaceOf(0.25)} />);
    expect(gapHeight()).toBe(0.25 * UNITS_PER_INCH);
    expect(screen.getByText('1/4 in (6 mm)')).toBeTruthy();
    expect(screen.getByRole('img').getAttribute('aria-label')).toContain('1/4 in (6 mm)');
  });

  it('uses one scale for every recipe: green beans’ 1 in is four times jam’s 1/4 in (USDA Guide)', () => {
    const { unmount } = render(<HeadspacePicture headspace={headspaceOf(0.25)} />);
    const jam = gapHeight();
    unmount();
    render(<HeadspacePicture headspace={headspaceOf(1)} />);
    expect(gapHeight()).toBe(4 * jam);
    expect(screen.getByText('1 in (25 mm)')).toBeTruthy();
  });

  it('labels 1/2 in as 13 mm (1 in = 25.4 mm exactly, NIST Handbook 44)', () => {
    render(<HeadspacePicture headspace={headspaceOf(0.5)} />);
    expect(gapHeight()).toBe(UNITS_PER_INCH / 2);
    expect(screen.getByText('1/2 in (13 mm)')).toBeTruthy();
  });

  it('rules the ruler in eighths of an inch at the same scale', () => {
    render(<HeadspacePicture headspace={headspaceOf(1.25)} />);
    const ticks = screen.getByTestId('headspace-ruler').querySelectorAll('line');
    const ys = [...ticks].map((t) => Number(t.getAttribute('y1')));
    expect(ys[1]! - ys[0]!).toBe(UNITS_PER_INCH / 8);
    expect(gapHeight()).toBe(1.25 * UNITS_PER_INCH);
  });
});
