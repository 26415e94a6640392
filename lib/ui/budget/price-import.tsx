import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { importPrices } from '@/lib/api/price-book';
import { spacing } from '@/lib/theme';
import { Button } from '../button';
import { Card } from '../card';
import { Notice } from '../notice';
import { Text } from '../text';
import { TextField } from '../text-field';

/** Paste a CSV (as exported) and import it: all of it, or nothing with each bad line named. */
export function PriceImport({ onImported }: { onImported: () => void }) {
  const [csv, setCsv] = useState('');
  const [busy, setBusy] = useState(false);
  const [problems, setProblems] = useState<string[]>([]);
  const [done, setDone] = useState<string | null>(null);
  const run = async () => {
    setBusy(true);
    setDone(null);
    try {
      const result = await importPrices(csv);
      setProblems([]);
      setDone(`${result.imported} prices read, ${result.changed} changed.`);
      onImported();
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      const lines = Object.entries(error.fields).map(
        ([field, messages]) =>
          `${field.replace(/^csv\./, 'Line ').replace('line ', '')}: ${messages.join('; ')}`,
      );
      setProblems([error.message, ...lines]);
    } finally {
      setBusy(false);
    }
  };
  return (
    <Card title="Import prices from CSV">
      <Text variant="caption" tone="muted">
        Columns key and value are read (note too); the unit, if present, must match. A file with any bad line
        changes nothing.
      </Text>
      <TextField
        label="CSV text"
        value={csv}
        onChangeText={setCsv}
        multiline
        numberOfLines={5}
        testID="price-import-text"
      />
      <View style={styles.actions}>
        <Button
          label="Import"
          variant="secondary"
          busy={busy}
          disabled={!csv.trim()}
          onPress={run}
          testID="price-import"
        />
      </View>
      {problems.length ? (
        <Notice tone="error" title="Nothing imported">
          {problems.join('\n')}
        </Notice>
      ) : null}
      {done ? <Notice tone="success">{done}</Notice> : null}
    </Card>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', gap: spacing.sm } });
