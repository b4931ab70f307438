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
import { type FormEvent, useState } from 'react';
import { api } from '@/lib/api-client';

/** The admin's choice of the nation whose rules apply and the scheme the contractor notifies through. */
export function NotificationSettings({ organisationId, nation, scheme, onClose }: { organisationId: string; nation: Nation; scheme: string | null; onClose: () => void }) {
  const queryClient = useQueryClient();
  const [chosen, setChosen] = useState<Nation>(nation);
  const [name, setName] = useState(scheme ?? '');
  const [error, setError] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: () => api.patch(`/organisations/${organisationId}`, { nation: chosen, ...(name.trim() ? { competentPersonScheme: name.trim() } : {}) }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ['notifiable-work'] });
      onClose();
    },
  });
  function submit(e: FormEvent) {
    e.preventDefault();
    if (name.trim().length > 100) return setError('Scheme: at most 100 characters.');
    setError(null);
    save.mutate();
  }
  return (
    <Dialog open onClose={onClose} aria-labelledby="notification-settings-title" fullWidth maxWidth="sm">
      <Stack component="form" aria-label="Rules and scheme" noValidate onSubmit={submit}>
        <DialogTitle id="notification-settings-title">Rules and scheme</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {save.isError && <Alert severity="error">{save.error.message}</Alert>}
            <TextField select label="Where the contractor works" value={chosen} onChange={(e) => setChosen(e.target.value as Nation)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
              {NATIONS.map((n) => (
                <option key={n} value={n}>
                  {NATION_WORDS[n]}
                </option>
              ))}
            </TextField>
            <TextField
              label="Competent person scheme"
              value={name}
              onChange={(e) => setName(e.target.value)}
              error={!!error}
              helperText={error ?? 'The scheme the contractor notifies through, by name.'}
            />
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
