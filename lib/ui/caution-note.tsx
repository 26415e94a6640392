import { memo } from 'react';
import { Notice } from './notice';

/** The product's caution (DESIGN.md §8), shown wherever a result is. */
export const cautionText =
  'Preliminary check only — not a structural design. A licensed engineer or your local building code decides the member. Shore the structure before removing any bearing element. Local codes and the building official govern.';

/** Extra sentence for shoring screens. */
export const shoringCautionText = 'The shoring itself may need an engineer’s design.';

function CautionNoteView({ shoring = false }: { shoring?: boolean }) {
  return (
    <Notice tone="warning" testID="caution-note">
      {shoring ? `${cautionText} ${shoringCautionText}` : cautionText}
    </Notice>
  );
}

/** The caution every result screen carries; `shoring` adds the shoring sentence. Never drawn again for a new result. */
export const CautionNote = memo(CautionNoteView);
