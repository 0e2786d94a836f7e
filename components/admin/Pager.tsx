import { StyleSheet, Text, View } from 'react-native';
import { space, type } from '../theme';
import { Button } from '../ui/Button';

interface PagerProps {
  offset: number;
  limit: number;
  total: number;
  /** How many rows this page holds. */
  shown: number;
  /** What the rows are, in the plural: "users", "events". */
  noun: string;
  onOffset: (offset: number) => void;
  busy?: boolean;
}

/** Where this page sits in the whole list, and the way to the pages before and after it. */
export function Pager({ offset, limit, total, shown, noun, onOffset, busy = false }: PagerProps) {
  if (total <= limit && offset === 0) {
    return (
      <Text testID="page-status" style={type.caption}>
        {total} {noun}
      </Text>
    );
  }
  return (
    <View style={styles.row}>
      <Text testID="page-status" style={[type.caption, styles.status]}>
        {shown > 0 ? `${offset + 1}–${offset + shown}` : 'None'} of {total} {noun}
      </Text>
      <View style={styles.buttons}>
        <Button
          testID="page-prev"
          variant="quiet"
          label="Previous page"
          disabled={busy || offset === 0}
          onPress={() => onOffset(Math.max(0, offset - limit))}
        />
        <Button
          testID="page-next"
          variant="quiet"
          label="Next page"
          disabled={busy || offset + limit >= total}
          onPress={() => onOffset(offset + limit)}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  status: { flexShrink: 1 },
  buttons: { flexDirection: 'row', gap: space.xs },
});
