import { fireEvent, render, screen, within } from '@testing-library/react';
import { Theme } from '@radix-ui/themes';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { SHORTCUTS } from '@/config/shortcuts';
import { ShortcutsDialog } from './shortcuts-dialog';
import {
  ShortcutsProvider,
  useShortcutHandlers,
  type ShortcutHandlers,
} from './shortcuts-provider';

function Page({ handlers }: { handlers: ShortcutHandlers }) {
  useShortcutHandlers(handlers);
  return <input aria-label="Note" />;
}

function setUp() {
  const handlers = { goShows: vi.fn(), toggleHeatMap: vi.fn(), stepForward: vi.fn() };
  const onHelp = vi.fn();
  function App() {
    const [shown, setShown] = useState(true);
    return (
      <ShortcutsProvider enabled onHelp={onHelp}>
        {shown ? <Page handlers={handlers} /> : null}
        <button onClick={() => setShown(false)}>Leave</button>
      </ShortcutsProvider>
    );
  }
  render(<App />);
  const press = (key: string, target: Element = document.body) =>
    fireEvent.keyDown(target, { key });
  return { handlers, onHelp, press };
}

describe('the shortcut listener', () => {
  it('sends "g" then "h" to navigation only, never to the page’s own "h"-like keys', () => {
    const { handlers, press } = setUp();
    press('g');
    press('h');
    expect(handlers.goShows).toHaveBeenCalledTimes(1);
    // The key after "g" ends the sequence even when it is a page key: "g m" does nothing.
    press('g');
    press('m');
    expect(handlers.toggleHeatMap).not.toHaveBeenCalled();
    press('m');
    expect(handlers.toggleHeatMap).toHaveBeenCalledTimes(1);
  });

  it('leaves keys alone while typing in a field or while a dialog is open', () => {
    const { handlers, press } = setUp();
    press('m', screen.getByLabelText('Note'));
    press('.', screen.getByLabelText('Note'));
    expect(handlers.toggleHeatMap).not.toHaveBeenCalled();
    expect(handlers.stepForward).not.toHaveBeenCalled();
    const dialog = document.createElement('div');
    dialog.setAttribute('role', 'dialog');
    document.body.append(dialog);
    press('.');
    dialog.remove();
    expect(handlers.stepForward).not.toHaveBeenCalled();
    press('.');
    expect(handlers.stepForward).toHaveBeenCalledTimes(1);
  });

  it('opens the list with "?", and forgets a page’s keys once it has gone', () => {
    const { handlers, onHelp, press } = setUp();
    press('?');
    expect(onHelp).toHaveBeenCalledTimes(1);
    fireEvent.click(screen.getByText('Leave'));
    press('m');
    expect(handlers.toggleHeatMap).not.toHaveBeenCalled();
  });
});

describe('the shortcut list', () => {
  it('shows every shortcut of the table, the take player’s transport and notes keys too', () => {
    render(
      <Theme>
        <ShortcutsDialog open onOpenChange={() => undefined} />
      </Theme>,
    );
    const dialog = screen.getByRole('dialog');
    for (const s of SHORTCUTS) within(dialog).getByTestId(`shortcut-${s.command}`);
    expect(within(dialog).getByRole('heading', { name: 'Take player: transport' })).toBeTruthy();
    expect(within(dialog).getByRole('heading', { name: 'Take player: notes' })).toBeTruthy();
    const heat = within(dialog).getByTestId('shortcut-toggleHeatMap');
    expect(heat.textContent).toBe('MHeat map on or off');
  });
});
