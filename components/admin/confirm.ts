import { askToConfirm } from '../ui/ConfirmDialog';

/**
 * Asks before a change that others will feel, in the page's own confirm dialog (components/ui/ConfirmDialog.tsx),
 * never the browser's: `question` is its heading, `detail` what follows from it, `action` the verb on the
 * button that goes ahead. `onConfirm` runs only on that button.
 */
export function confirmChange(question: string, detail: string, action: string, onConfirm: () => void) {
  askToConfirm({ title: question, detail, confirmLabel: action, onConfirm });
}
