import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { useState } from 'react';
import { Pressable, Text } from 'react-native';
import { confirmChange } from '../admin/confirm';
import { ConfirmDialog, ConfirmHost } from './ConfirmDialog';

/** A page with a button that opens the dialog, as a screen would. */
function Page({ onConfirm }: { onConfirm: () => void }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Pressable testID="opener" role="button" onPress={() => setOpen(true)}>
        <Text>Delete</Text>
      </Pressable>
      <ConfirmDialog
        open={open}
        title="Delete this saved check?"
        detail="Its link will stop working."
        confirmLabel="Delete"
        onCancel={() => setOpen(false)}
        onConfirm={() => {
          setOpen(false);
          onConfirm();
        }}
      />
    </>
  );
}

const open = async () => {
  const opener = screen.getByTestId('opener');
  act(() => opener.focus());
  fireEvent.click(opener);
  return screen.findByTestId('confirm-dialog');
};

describe('ConfirmDialog', () => {
  it('is a modal alert dialog labelled by its question and described by its detail', async () => {
    render(<Page onConfirm={() => {}} />);
    expect(screen.queryByTestId('confirm-dialog')).toBeNull();
    const dialog = await open();
    expect(dialog.getAttribute('role')).toBe('alertdialog');
    expect(dialog.getAttribute('aria-modal')).toBe('true');
    expect(document.getElementById(dialog.getAttribute('aria-labelledby')!)!.textContent).toBe('Delete this saved check?');
    expect(document.getElementById(dialog.getAttribute('aria-describedby')!)!.textContent).toBe('Its link will stop working.');
  });

  it('moves focus to Cancel when it opens', async () => {
    render(<Page onConfirm={() => {}} />);
    await open();
    await waitFor(() => expect(document.activeElement).toBe(screen.getByTestId('confirm-dialog-cancel')));
  });

  it('cancels on Escape without going ahead, and gives focus back to the button that opened it', async () => {
    const onConfirm = jest.fn();
    render(<Page onConfirm={onConfirm} />);
    await open();
    await waitFor(() => expect(document.activeElement).toBe(screen.getByTestId('confirm-dialog-cancel')));
    fireEvent.keyUp(document, { key: 'Escape' });
    await waitFor(() => expect(screen.queryByTestId('confirm-dialog')).toBeNull());
    expect(onConfirm).not.toHaveBeenCalled();
    await waitFor(() => expect(document.activeElement).toBe(screen.getByTestId('opener')));
  });

  it('goes ahead only on its own button', async () => {
    const onConfirm = jest.fn();
    render(<Page onConfirm={onConfirm} />);
    await open();
    fireEvent.click(screen.getByTestId('confirm-dialog-cancel'));
    await waitFor(() => expect(screen.queryByTestId('confirm-dialog')).toBeNull());
    expect(onConfirm).not.toHaveBeenCalled();
    await open();
    fireEvent.click(screen.getByTestId('confirm-dialog-accept'));
    expect(onConfirm).toHaveBeenCalledTimes(1);
  });
});

describe('confirmChange', () => {
  it('asks in the page, never through window.confirm, and runs the change only on yes', async () => {
    const native = jest.spyOn(window, 'confirm');
    const onConfirm = jest.fn();
    render(<ConfirmHost />);
    act(() => confirmChange('Remove this group?', 'The claim check stops treating these as one thing.', 'Remove', onConfirm));
    const dialog = await screen.findByTestId('confirm-dialog');
    expect(dialog.textContent).toContain('Remove this group?');
    expect(screen.getByTestId('confirm-dialog-accept').textContent).toBe('Remove');
    fireEvent.click(screen.getByTestId('confirm-dialog-accept'));
    expect(onConfirm).toHaveBeenCalledTimes(1);
    await waitFor(() => expect(screen.queryByTestId('confirm-dialog')).toBeNull());
    expect(native).not.toHaveBeenCalled();
    native.mockRestore();
  });
});
