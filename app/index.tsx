import { router, useLocalSearchParams } from 'expo-router';
import { LibraryScreen, type LibrarySearch } from '@/components/screens/LibraryScreen';

/** Drops empty values, so that the address carries only what is set (`/?q=wheel`, not `/?q=wheel&law=`). */
const present = ({ q, law, mechanism }: LibrarySearch): Record<string, string> =>
  Object.fromEntries(Object.entries({ q, law, mechanism }).filter((kv): kv is [string, string] => Boolean(kv[1])));

/**
 * The Library. Its query and filters live in the address (`/?q=wheel&law=energy&mechanism=over-unity`),
 * so that a search can be shared and reloaded: typing replaces the address (no history entry per key),
 * choosing a filter adds a history entry, so Back returns to the search before it.
 */
export default function LibraryRoute() {
  const { q, law, mechanism } = useLocalSearchParams<{ q?: string; law?: string; mechanism?: string }>();
  return (
    <LibraryScreen
      query={q ?? ''}
      filters={{ law, mechanism }}
      onSearchChange={(search, how) => {
        if (how === 'push') router.push({ pathname: '/', params: present(search) });
        else router.setParams({ q: search.q || undefined, law: search.law, mechanism: search.mechanism });
      }}
    />
  );
}
