// @vitest-environment jsdom
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { ViewTabs } from '../../../src/ui/layout/ViewTabs';
import { lazyPart } from '../../../src/ui/layout/LazyPart';

/** A load that the test settles by hand. */
function manualLoad<T>() {
  let settle: { ok: (v: T) => void; fail: (e: Error) => void } | null = null;
  let calls = 0;
  const load = () => {
    calls++;
    return new Promise<T>((ok, fail) => {
      settle = { ok, fail };
    });
  };
  return {
    load,
    calls: () => calls,
    resolve: (v: T) => settle?.ok(v),
    reject: (e: Error) => settle?.fail(e),
  };
}

function Greeting({ who }: { who: string }) {
  return <p>Hello {who}</p>;
}

describe('a part whose code loads when first shown', () => {
  it('shows a plain loading line, then the part with its props', async () => {
    const load = manualLoad<typeof Greeting>();
    const Part = lazyPart<{ who: string }>('greeting', load.load);
    render(<Part who="Ada" />);
    expect(screen.getByRole('status')).toHaveTextContent('Loading the greeting…');
    load.resolve(Greeting);
    expect(await screen.findByText('Hello Ada')).toBeInTheDocument();
    expect(screen.queryByRole('status')).toBeNull();
  });

  it('says plainly when the code cannot be fetched, and tries again on request', async () => {
    const load = manualLoad<typeof Greeting>();
    const Part = lazyPart<{ who: string }>('greeting', load.load);
    const user = userEvent.setup();
    // React logs a caught render error to the console; this one is expected.
    const quiet = console.error;
    console.error = () => {};
    try {
      render(<Part who="Ada" />);
      load.reject(new Error('Failed to fetch dynamically imported module'));
      const alert = await screen.findByRole('alert');
      expect(alert).toHaveTextContent(
        'The greeting could not be loaded (Failed to fetch dynamically imported module). The scenario on screen is not affected.',
      );
      await user.click(screen.getByRole('button', { name: 'Try again' }));
      expect(load.calls()).toBe(2);
      load.resolve(Greeting);
      expect(await screen.findByText('Hello Ada')).toBeInTheDocument();
      expect(screen.queryByRole('alert')).toBeNull();
    } finally {
      console.error = quiet;
    }
  });

  it('is fetched once: a second showing renders from the loaded code', async () => {
    const load = manualLoad<typeof Greeting>();
    const Part = lazyPart<{ who: string }>('greeting', load.load);
    const first = render(<Part who="Ada" />);
    load.resolve(Greeting);
    await screen.findByText('Hello Ada');
    first.unmount();
    render(<Part who="Grace" />);
    expect(await screen.findByText('Hello Grace')).toBeInTheDocument();
    expect(load.calls()).toBe(1);
  });
});

describe('the view tabs', () => {
  it('mount a view only when it is first opened, and keep it mounted while hidden', async () => {
    const user = userEvent.setup();
    let mounts = 0;
    function Counted() {
      mounts++;
      return <p>Second view</p>;
    }
    render(
      <ViewTabs
        views={[
          { id: 'one', label: 'One', content: <p>First view</p> },
          { id: 'two', label: 'Two', content: <Counted /> },
        ]}
      />,
    );
    expect(screen.getByText('First view')).toBeVisible();
    expect(screen.queryByText('Second view')).toBeNull();
    expect(mounts).toBe(0);
    await user.click(screen.getByRole('tab', { name: 'Two' }));
    expect(screen.getByText('Second view')).toBeVisible();
    await user.click(screen.getByRole('tab', { name: 'One' }));
    // Still there, hidden, so what was typed in it survives.
    expect(screen.getByText('Second view')).not.toBeVisible();
    expect(screen.getByText('First view')).toBeVisible();
  });
});
