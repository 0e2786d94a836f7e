import { Text } from 'react-native';
import type { SectionKey } from '../nav/sections';
import { type } from '../theme';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';

type PlannedSection = Exclude<SectionKey, 'library' | 'checks'>;

interface Plan {
  title: string;
  /** What the section will do, from the product brief. */
  purpose: string;
  /** Who it is for and when it opens. */
  status: string;
}

const plans: Record<PlannedSection, Plan> = {
  check: {
    title: 'Claim check',
    purpose:
      'Paste a claim — an abstract, a press release, a pitch — and Counterweight finds the entries that match it and shows the words that matched, picks out the figures in the text with their units, and runs the checks that apply. You get a referee paragraph with numbered references, ready to paste, and can save the check or share it by link.',
    status: 'Claim checks open once the library has published entries to match against.',
  },
  desk: {
    title: 'Desk',
    purpose:
      'Where editors work: your drafts, the drafts of other editors waiting for your review, and what was published recently.',
    status: 'The desk opens for editors once accounts and drafts exist.',
  },
  queue: {
    title: 'Queue',
    purpose:
      'Sightings and corrections sent in by contributors, waiting for a decision, oldest first. A moderator accepts each into an entry, turns it into a draft, asks for more, or declines it with a reason.',
    status: 'The queue opens for moderators once contributors can send sightings and corrections.',
  },
  account: {
    title: 'Account',
    purpose:
      'Sign in or register here. With a verified e-mail address you can send sightings and corrections and keep your saved claim checks. Reading, running worksheets, citing and exporting need no account.',
    status: 'Accounts are not open yet; everything here works without one for now.',
  },
  admin: {
    title: 'Admin',
    purpose:
      'For operators: users and their roles, the audit log of who did what to which record, and, in development, the outbox of the mail the app would have sent.',
    status: 'Administration opens once accounts exist.',
  },
};

/** A section that is planned but not built yet: what it will hold, and when. */
export function PlaceholderScreen({ section }: { section: PlannedSection }) {
  const plan = plans[section];
  return (
    <Screen testID={`screen-${section}`} title={plan.title}>
      <Text style={type.reading}>{plan.purpose}</Text>
      <Notice testID={`${section}-status`} title="Not open yet">
        {plan.status}
      </Notice>
    </Screen>
  );
}
