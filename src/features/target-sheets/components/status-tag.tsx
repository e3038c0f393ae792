import type { TargetSheetStatus } from '../../../../shared/schemas/target-sheet.ts';
import { Tag } from '../../../components/ui/tag.tsx';

export const statusWords: Record<TargetSheetStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  released: 'Released',
  returned: 'Sent back',
};

/** A sheet's state in words (colour only repeats what the words say). */
export function StatusTag({ status }: { status: TargetSheetStatus }) {
  const tone = status === 'released' ? 'accent' : status === 'draft' ? 'plain' : 'signal';
  return <Tag tone={tone}>{statusWords[status]}</Tag>;
}
