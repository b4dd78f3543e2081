import { forwardRef, type ComponentProps } from 'react';
import { TextField } from './field';

type Props = Omit<ComponentProps<typeof TextField>, 'type' | 'inputMode' | 'step' | 'min'>;

/**
 * A box for a size in inches. It is a text box on purpose: people write "2 1/4", "2-1/4", "2 ¼"
 * or "8/4", which a number box would refuse or turn into 214. The shared schema reads the text.
 */
export const InchesField = forwardRef<HTMLInputElement, Props>(function InchesField(props, ref) {
  return <TextField ref={ref} type="text" autoComplete="off" spellCheck={false} autoCorrect="off" {...props} />;
});
