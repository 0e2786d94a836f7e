import { Alert, Platform } from 'react-native';

/** Asks before a change that others will feel: the browser's own dialog on the web, an alert on a phone app. */
export function confirmChange(question: string, detail: string, action: string, onConfirm: () => void) {
  if (Platform.OS === 'web') {
    if (window.confirm(`${question}\n\n${detail}`)) onConfirm();
    return;
  }
  Alert.alert(question, detail, [
    { text: 'Cancel', style: 'cancel' },
    { text: action, onPress: onConfirm },
  ]);
}
