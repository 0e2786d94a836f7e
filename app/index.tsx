import { router, useLocalSearchParams } from 'expo-router';
import { LibraryScreen } from '@/components/screens/LibraryScreen';

/** The Library, its filters kept in the address (`/?law=energy&mechanism=over-unity`) so a filtered list can be shared. */
export default function LibraryRoute() {
  const { law, mechanism } = useLocalSearchParams<{ law?: string; mechanism?: string }>();
  return <LibraryScreen initialFilters={{ law, mechanism }} onFiltersChange={({ law: l, mechanism: m }) => router.setParams({ law: l, mechanism: m })} />;
}
