import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type Nation, NATION_WORDS, NATIONS } from '@wiretrail/core';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { api } from '@/lib/api-client';

export const settingsSchema = z.object({
  nation: z.enum(NATIONS),
  scheme: z.string().trim().max(100, 'Scheme: at most 100 characters.'),
});
type Values = z.input<typeof settingsSchema>;

/** The admin's choice of the nation whose rules apply and the scheme the contractor notifies through. */
export function NotificationSettings({ organisationId, nation, scheme, onClose }: { organisationId: string; nation: Nation; scheme: string | null; onClose: () => void }) {
  const queryClient = useQueryClient();
  const { register, handleSubmit, formState } = useForm<Values, unknown, z.output<typeof settingsSchema>>({
    resolver: zodResolver(settingsSchema),
    defaultValues: { nation, scheme: scheme ?? '' },
  });
  const save = useMutation({
    // An emptied name is sent as null so that the scheme is cleared, not kept.
    mutationFn: (v: z.output<typeof settingsSchema>) => api.patch(`/organisations/${organisationId}`, { nation: v.nation, competentPersonScheme: v.scheme || null }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ['notifiable-work'] });
      onClose();
    },
  });
  const schemeError = formState.errors.scheme?.message;
  return (
    <Dialog open onClose={onClose} aria-labelledby="notification-settings-title" fullWidth maxWidth="sm">
      <Stack component="form" aria-label="Rules and scheme" noValidate onSubmit={handleSubmit((v) => save.mutate(v))}>
        <DialogTitle id="notification-settings-title">Rules and scheme</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {save.isError && <Alert severity="error">{save.error.message}</Alert>}
            <TextField select label="Where the contractor works" {...register('nation')} defaultValue={nation} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
              {NATIONS.map((n) => (
                <option key={n} value={n}>
                  {NATION_WORDS[n]}
                </option>
              ))}
            </TextField>
            <TextField label="Competent person scheme" {...register('scheme')} error={!!schemeError} helperText={schemeError ?? 'The scheme the contractor notifies through, by name. Leave empty if none.'} />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={save.isPending}>
            Save
          </Button>
        </DialogActions>
      </Stack>
    </Dialog>
  );
}
