import { CAUTION_TEXT } from '../shared/caution';
import { Notice } from './ui/Notice';

/** The caution shown on every result screen. */
export function CautionBanner() {
  return <Notice tone="caution" label="Caution" text={CAUTION_TEXT} />;
}
