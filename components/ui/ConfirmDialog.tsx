import { useEffect, useId, useRef, useState } from 'react';
import { Modal, Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '../theme';
import { Button } from './Button';

interface ConfirmDialogProps {
  open: boolean;
  /** The question, as a sentence: "Make Farah Osei an editor?" */
  title: string;
  /** What follows from saying yes. */
  detail?: string;
  /** The verb on the button that goes ahead: "Delete", "Change the role". */
  confirmLabel: string;
  cancelLabel?: string;
  onConfirm: () => void;
  onCancel: () => void;
  testID?: string;
}

/**
 * Asks before a change that others will feel, in the page rather than in the browser's own dialog: an
 * alert dialog (modal, labelled by its question, described by its detail). Focus moves to "Cancel" when
 * it opens and stays inside while it is open; Escape or a tap outside cancels; focus returns to where it
 * was when it closes.
 */
export function ConfirmDialog({ open, title, detail, confirmLabel, cancelLabel = 'Cancel', onConfirm, onCancel, testID = 'confirm-dialog' }: ConfirmDialogProps) {
  const titleId = useId();
  const detailId = useId();
  const box = useRef<View>(null);

  // The safe choice takes focus first; the Modal keeps it inside and gives it back when it closes.
  useEffect(() => {
    if (!open || Platform.OS !== 'web') return;
    const frame = requestAnimationFrame(() => {
      const cancel = (box.current as unknown as HTMLElement | null)?.querySelector<HTMLElement>(`[data-testid="${testID}-cancel"]`);
      cancel?.focus();
    });
    return () => cancelAnimationFrame(frame);
  }, [open, testID]);

  return (
    <Modal visible={open} transparent animationType="none" onRequestClose={onCancel}>
      <View style={styles.backdrop}>
        <Pressable style={StyleSheet.absoluteFill} onPress={onCancel} aria-label={cancelLabel} tabIndex={-1} />
        <View
          ref={box}
          role="alertdialog"
          aria-modal
          aria-labelledby={titleId}
          aria-describedby={detail ? detailId : undefined}
          testID={testID}
          style={styles.box}
        >
          <Text id={titleId} role="heading" aria-level={2} style={type.heading}>
            {title}
          </Text>
          {detail ? (
            <Text id={detailId} style={type.body}>
              {detail}
            </Text>
          ) : null}
          <View style={styles.actions}>
            <Button variant="quiet" label={cancelLabel} onPress={onCancel} testID={`${testID}-cancel`} />
            <Button label={confirmLabel} onPress={onConfirm} testID={`${testID}-accept`} />
          </View>
        </View>
      </View>
    </Modal>
  );
}

/** One question waiting for an answer. */
export interface ConfirmRequest {
  title: string;
  detail?: string;
  confirmLabel: string;
  onConfirm: () => void;
}

type Show = (request: ConfirmRequest) => void;
/** The mounted hosts, the newest last: it is the one that asks. */
const hosts: Show[] = [];

/**
 * Asks a question in the page's confirm dialog and runs `onConfirm` only on "yes". Needs a
 * `<ConfirmHost />` mounted (the Shell has one); without one, nothing is asked and nothing runs.
 */
export function askToConfirm(request: ConfirmRequest): boolean {
  const show = hosts[hosts.length - 1];
  if (!show) return false;
  show(request);
  return true;
}

/** Where the questions of `askToConfirm` appear; mounted once, in the Shell. */
export function ConfirmHost() {
  const [request, setRequest] = useState<ConfirmRequest | null>(null);
  useEffect(() => {
    const show: Show = (next) => setRequest(next);
    hosts.push(show);
    return () => {
      hosts.splice(hosts.indexOf(show), 1);
    };
  }, []);
  return (
    <ConfirmDialog
      open={request !== null}
      title={request?.title ?? ''}
      detail={request?.detail}
      confirmLabel={request?.confirmLabel ?? 'Go ahead'}
      onCancel={() => setRequest(null)}
      onConfirm={() => {
        const run = request?.onConfirm;
        setRequest(null);
        run?.();
      }}
    />
  );
}

const styles = StyleSheet.create({
  backdrop: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    padding: space.md,
    // The page dimmed behind the question, in either palette.
    backgroundColor: 'rgba(0, 0, 0, 0.45)',
  },
  box: {
    width: '100%',
    maxWidth: 480,
    gap: space.sm,
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: space.lg,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'flex-end', gap: space.sm, marginTop: space.xs },
});
