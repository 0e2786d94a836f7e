import { useState } from 'react';
import { StyleSheet, Text } from 'react-native';
import { ApiError } from '../http/client';
import { useWorksheet } from '../queries/worksheets';
import { type } from '../theme';
import { ErrorNotice } from '../ui/ErrorNotice';
import { Loading } from '../ui/Loading';
import { Screen } from '../ui/Screen';
import { BackLink } from './BackLink';
import { Permalink, useAddressSync } from './permalink';
import { initialTexts } from './useTypedInputs';
import { WorksheetView } from './WorksheetView';

interface WorksheetScreenProps {
  name: string;
  /** The address's query: typed inputs by name. */
  query: Record<string, string>;
}

/** A starter worksheet on its own page, fetched from the API and evaluated here, with a permalink. */
export function WorksheetScreen({ name, query }: WorksheetScreenProps) {
  const { data, error, isPending, refetch } = useWorksheet(name);
  const [values, setValues] = useState<Record<string, string>>();
  useAddressSync(values);

  if (isPending) {
    return (
      <Screen testID="screen-worksheet" title="Worksheet">
        <Loading testID="worksheet-loading" label="Loading the worksheet…" />
      </Screen>
    );
  }
  if (error) {
    const missing = error instanceof ApiError && error.status === 404;
    return (
      <Screen testID="screen-worksheet" title={missing ? 'No such worksheet' : 'Worksheet'}>
        {missing ? (
          <Text testID="worksheet-not-found" style={type.reading}>
            There is no starter worksheet called <Text style={styles.mono}>{name}</Text>. The address may be mistyped,
            or the worksheet may have been renamed.
          </Text>
        ) : (
          <ErrorNotice testID="worksheet-error" error={error} what="this worksheet" onRetry={() => void refetch()} />
        )}
        <BackLink testID="worksheet-back" />
      </Screen>
    );
  }

  const { worksheet } = data;
  return (
    <Screen testID="screen-worksheet" title={worksheet.title} lead={worksheet.summary}>
      <WorksheetView worksheet={worksheet} initialValues={query} onValuesChange={setValues} />
      <Permalink values={values ?? initialTexts(worksheet.inputs, query)} />
      <BackLink testID="worksheet-back" />
    </Screen>
  );
}

const styles = StyleSheet.create({
  mono: { ...type.mono, fontSize: 16 },
});
