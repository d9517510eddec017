import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import { OutcomeBadge } from '../../src/components/ui/outcome-badge';

describe('OutcomeBadge', () => {
  it.each([
    ['clean', 'Clean'],
    ['partial', 'Partial'],
    ['failed', 'Failed'],
  ] as const)('for a %s purification, says "%s" in words and not by colour alone', (outcome, word) => {
    render(<OutcomeBadge outcome={outcome} />);
    const badge = screen.getByText(word);
    expect(badge).toHaveAttribute('title', expect.stringMatching(new RegExp(`^Outcome: ${outcome}`)));
    expect(badge.className).toContain(`text-${outcome}`);
    expect(badge.querySelector('[aria-hidden="true"]')?.textContent).toMatch(/\S/);
  });

  it('gives each outcome its own mark, so the three differ in shape too', () => {
    const marks = (['clean', 'partial', 'failed'] as const).map((o) => {
      const { container, unmount } = render(<OutcomeBadge outcome={o} />);
      const mark = container.querySelector('[aria-hidden="true"]')!.textContent;
      unmount();
      return mark;
    });
    expect(new Set(marks).size).toBe(3);
  });
});
