import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { progress } from '../testing/garage-fixtures';
import { ProgressBar } from './progress-bar';

describe('progress bar', () => {
  it('when some lines are inspected, then the bar reports the percentage and splits by status', () => {
    const { container } = render(<ProgressBar label="Progress of Brakes" progress={progress(8, { reuse: 2, replace: 1, missing: 1 })} showLegend />);
    const bar = screen.getByRole('progressbar', { name: 'Progress of Brakes' });
    expect(bar).toHaveAttribute('aria-valuenow', '50');
    expect(screen.getByText('4 of 8 inspected · 50%')).toBeInTheDocument();
    // One segment per decided status, each as wide as its share of all lines.
    const widths = [...bar.children].map((c) => (c as HTMLElement).style.width);
    expect(widths).toEqual(['25%', '12.5%', '12.5%']);
    const legend = within(screen.getByRole('list', { name: 'Lines by status' }));
    expect(legend.getByText('Reuse as is: 2')).toBeInTheDocument();
    expect(legend.getByText('Missing: 1')).toBeInTheDocument();
    expect(container.textContent).not.toContain('Not inspected:');
  });

  it('when no line applies, then it says so instead of 0%', () => {
    render(<ProgressBar label="Progress of Winch" progress={progress(0)} />);
    expect(screen.getByText('No lines apply')).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Progress of Winch' })).toHaveAttribute('aria-valuenow', '0');
  });
});
