import type { SafetyCaution } from '../../shared/safety';
import { Notice } from './ui/notice';

/** One of Stickerline's safety cautions, boxed the same way everywhere. */
export function SafetyNotice({ caution }: { caution: SafetyCaution }) {
  return (
    <div data-testid={`caution-${caution.id}`}>
      <Notice tone="caution" title={caution.title}>{caution.text}</Notice>
    </div>
  );
}
