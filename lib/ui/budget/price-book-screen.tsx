import { useState } from 'react';
import { View } from 'react-native';
import { PRICE_BOOK_CSV_PATH } from '@/lib/api/price-book';
import { priceCategories, type PriceCategory } from '@/lib/budget';
import { usePriceBook } from '@/lib/hooks/use-budgets';
import { useMe } from '@/lib/hooks/use-me';
import { Button } from '../button';
import { Card } from '../card';
import { ErrorView } from '../error-view';
import { LoadingView } from '../loading-view';
import { Notice } from '../notice';
import { PickerField } from '../picker-field';
import { Screen } from '../screen';
import { Text } from '../text';
import { categoryWords } from './category-words';
import { downloadFile } from './download-file';
import { PriceImport } from './price-import';
import { PriceRow } from './price-row';

/** The firm's price book by category: each price with its date and who set it, stale ones said so. */
export function PriceBookScreen() {
  const { data: me } = useMe();
  const { data: book, error, mutate } = usePriceBook();
  const [category, setCategory] = useState<PriceCategory>('engineered-lumber');
  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (!book || !me) return <LoadingView />;
  const canEdit = me.role === 'owner' || me.role === 'estimator';
  const rows = [
    ...book.items.filter((i) => i.category === category),
    ...book.unpriced.filter((i) => i.category === category),
  ];
  const staleCount = book.items.filter((i) => i.stale).length;
  return (
    <Screen
      title="Price book"
      actions={
        <Button
          label="Export CSV"
          variant="secondary"
          onPress={() => downloadFile(PRICE_BOOK_CSV_PATH, 'price-book.csv')}
          testID="price-export"
        />
      }
    >
      <Text tone="muted">
        Prices older than {book.staleAfterDays} days show as stale.{' '}
        {canEdit ? '' : 'Your role reads the price book; the owner and the estimator change it.'}
      </Text>
      {staleCount ? (
        <Notice tone="warning">
          {staleCount} prices are stale: check them with the yard and the trades.
        </Notice>
      ) : null}
      <Card>
        <PickerField
          label="Category"
          choices={priceCategories.map((c) => ({ value: c, label: categoryWords[c] }))}
          value={category}
          onChange={setCategory}
          testID="price-category"
        />
        <View>
          {rows.map((item) => (
            <PriceRow
              key={`${item.key}-${'amount' in item ? item.amount : ''}`}
              item={item}
              canEdit={canEdit}
              onSaved={() => mutate()}
            />
          ))}
          {rows.length === 0 ? <Text tone="muted">Nothing in this category yet.</Text> : null}
        </View>
      </Card>
      {canEdit ? <PriceImport onImported={() => mutate()} /> : null}
    </Screen>
  );
}
