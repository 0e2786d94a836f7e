import { colors, focusRing, radius, space } from '../theme';

/** The look of every text box (form fields, typed quantities, the editor): one place to change it. */
export const inputBox = {
  box: {
    ...focusRing,
    marginTop: space.xxs,
    backgroundColor: colors.surface,
    borderColor: colors.ruleStrong,
    borderRadius: radius.sm,
    borderWidth: 1,
    minHeight: 44,
    paddingHorizontal: space.sm,
  },
  error: { borderColor: colors.brass, borderWidth: 2, backgroundColor: colors.brassWash },
  focused: { borderColor: colors.brass },
} as const;
