import TextField from '@mui/material/TextField';
import { type ComponentProps, lazy, Suspense } from 'react';
import type { DateInput as DateInputType } from './date-inputs';

// The pickers and their date library weigh more than the rest of a list screen; a screen that only filters by date
// fetches them after its first paint.
const DateInputLoaded = lazy(() => import('./date-inputs').then((m) => ({ default: m.DateInput })));

/** The same date field as `DateInput`, loaded on demand; an empty, still field of the same size holds its place. */
export function DateInputOnDemand(props: ComponentProps<typeof DateInputType>) {
  return (
    <Suspense fallback={<TextField label={props.label} size={props.size} sx={props.sx} disabled value="" slotProps={{ inputLabel: { shrink: true } }} />}>
      <DateInputLoaded {...props} />
    </Suspense>
  );
}
