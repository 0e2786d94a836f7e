/**
 * The part of the app a reader of the Library and of an entry does not need at first: every screen
 * but those two, and the heavy parts of an entry's page (its worksheets, the versions' differences,
 * the forms). Loaded as one chunk on first use, through `deferred()` (./deferred.tsx) only: a module
 * reached both from here and from the first load would be moved into the first load by Metro's
 * chunk splitting (modules two chunks share go to the common chunk, which the page loads at once),
 * so the screens of the first load never import this file or what it lists directly.
 *
 * mathjs (worksheets, checks, quantities), zod (the forms' schemas), KaTeX and the Markdown pipeline
 * (the Desk's preview and TeX checks), diff, compromise (the claim reader) and d3 come in here.
 */
import { checks } from '@/shared/checks';
import { isCheckName } from '@/shared/checks/run';
import { CheckScreen } from '../checks/CheckScreen';
import { SITE_NAME, usePageTitle } from '../ui/usePageTitle';

export { AccountScreen } from '../account/AccountScreen';
export { AuditScreen } from '../admin/AuditScreen';
export { OutboxScreen } from '../admin/OutboxScreen';
export { UsersScreen } from '../admin/UsersScreen';
export { ForgotScreen } from '../auth/ForgotScreen';
export { ResetScreen } from '../auth/ResetScreen';
export { SignInScreen } from '../auth/SignInScreen';
export { SignUpScreen } from '../auth/SignUpScreen';
export { VerifyScreen } from '../auth/VerifyScreen';
export { CheckListScreen } from '../checks/CheckListScreen';
export { ClaimCheckScreen } from '../claims/ClaimCheckScreen';
export { SavedClaimCheckScreen } from '../claims/SavedClaimCheckScreen';
export { DeskScreen } from '../desk/DeskScreen';
export { DraftScreen, NewEntryScreen } from '../desk/DraftScreen';
export { SynonymsScreen } from '../desk/SynonymsScreen';
export { EntryWorksheets } from '../entry/EntryWorksheets';
export { RetirePanel } from '../entry/RetirePanel';
export { ReviseButton } from '../entry/ReviseButton';
export { VersionsPanel } from '../entry/VersionsPanel';
export { QueueItemScreen } from '../queue/QueueItemScreen';
export { QueueScreen } from '../queue/QueueScreen';
export { ReportError, SeenInTheWild } from '../submissions/EntryParts';
export { ReportSightingScreen } from '../submissions/ReportSightingScreen';
export { SubmissionScreen } from '../submissions/SubmissionScreen';
export { WorksheetScreen } from '../worksheet/WorksheetScreen';

/** A check of the kit with its page title (the title needs the kit, which lives here). */
export function CheckPage({ name, query }: { name: string; query: Record<string, string> }) {
  const check = isCheckName(name) ? checks[name] : undefined;
  usePageTitle(`${check?.title ?? 'Check'} — ${SITE_NAME}`, check?.summary);
  return <CheckScreen name={name} query={query} />;
}
