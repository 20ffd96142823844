// @vitest-environment jsdom
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ErrorBoundary } from '../../src/ui/layout/ErrorBoundary';

function Broken(): never {
  throw new Error('bar 3 has no depth');
}

describe('when drawing fails', () => {
  it('the screen says so plainly instead of going blank, and offers a way out', async () => {
    const quiet = vi.spyOn(console, 'error').mockImplementation(() => {});
    const onSetAside = vi.fn();
    render(
      <ErrorBoundary onSetAside={onSetAside}>
        <Broken />
      </ErrorBoundary>,
    );
    expect(screen.getByRole('alert')).toHaveTextContent('Something went wrong on this screen: bar 3 has no depth.');
    await userEvent.click(screen.getByRole('button', { name: 'Set the saved scenario aside and start from the demo' }));
    expect(onSetAside).toHaveBeenCalledOnce();
    expect(screen.getByRole('button', { name: 'Reload' })).toBeInTheDocument();
    quiet.mockRestore();
  });

  it('draws its children when nothing fails', () => {
    render(
      <ErrorBoundary>
        <p>fine</p>
      </ErrorBoundary>,
    );
    expect(screen.getByText('fine')).toBeInTheDocument();
  });
});
