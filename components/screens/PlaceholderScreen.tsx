import { Text } from 'react-native';
import { RoleGate } from '../account/RoleGate';
import type { RoleSectionKey } from '../nav/sections';
import { type } from '../theme';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';

type PlannedSection = 'check' | Exclude<RoleSectionKey, 'admin' | 'desk'>;

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
  queue: {
    title: 'Queue',
    purpose:
      'Sightings and corrections sent in by contributors, waiting for a decision, oldest first. A moderator accepts each into an entry, turns it into a draft, asks for more, or declines it with a reason.',
    status: 'The queue opens once contributors can send sightings and corrections.',
  },
};

/** A section that is planned but not built yet: what it will hold, and when; the Queue only for its roles. */
export function PlaceholderScreen({ section }: { section: PlannedSection }) {
  const plan = plans[section];
  const status = (
    <Notice testID={`${section}-status`} title="Not open yet">
      {plan.status}
    </Notice>
  );
  return (
    <Screen testID={`screen-${section}`} title={plan.title}>
      <Text style={type.reading}>{plan.purpose}</Text>
      {section === 'check' ? status : <RoleGate section={section}>{status}</RoleGate>}
    </Screen>
  );
}
