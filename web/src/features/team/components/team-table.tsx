import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import Tooltip from '@mui/material/Tooltip';
import { useState } from 'react';
import type { Role } from '@wiretrail/core';
import { useSession } from '@/lib/session';
import { useUsers } from '../api/get-users';
import { useSendPasswordLink, useUpdatePerson } from '../api/manage-users';
import { AddPersonDialog } from './add-person-dialog';

/** The admin's view of everyone who signs in: role, active or not, and a password link when someone is locked out. */
export function TeamTable() {
  const session = useSession();
  const users = useUsers();
  const update = useUpdatePerson();
  const sendLink = useSendPasswordLink();
  const [adding, setAdding] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  if (users.isPending) return <LinearProgress aria-label="Loading the team" />;
  if (users.isError) return <Alert severity="error">{users.error.message}</Alert>;
  const failure = update.error ?? sendLink.error;
  return (
    <>
      <Stack direction="row" sx={{ justifyContent: 'flex-end', mb: 2 }}>
        <Button variant="contained" onClick={() => setAdding(true)}>
          Add a person
        </Button>
      </Stack>
      {failure && (
        <Alert severity="error" sx={{ mb: 2 }}>
          {failure.message}
        </Alert>
      )}
      <TableContainer component={Paper} variant="outlined">
        <Table aria-label="Team">
          <TableHead>
            <TableRow>
              <TableCell>Name</TableCell>
              <TableCell>E-mail</TableCell>
              <TableCell>Role</TableCell>
              <TableCell>Active</TableCell>
              <TableCell align="right">Password</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {users.data.items.map((u) => {
              const me = u.id === session?.user.id;
              return (
                <TableRow key={u.id}>
                  <TableCell>{u.name}</TableCell>
                  <TableCell>{u.email}</TableCell>
                  <TableCell>
                    <Tooltip title={me ? 'Nobody changes their own role; ask another admin.' : ''}>
                      <TextField
                        select
                        size="small"
                        value={u.role}
                        disabled={me || update.isPending}
                        slotProps={{ htmlInput: { 'aria-label': `Role of ${u.name}` } }}
                        onChange={(e) => update.mutate({ id: u.id, changes: { role: e.target.value as Role } })}
                        sx={{ minWidth: 150 }}
                      >
                        <MenuItem value="technician">Technician</MenuItem>
                        <MenuItem value="office">Office</MenuItem>
                        <MenuItem value="admin">Admin</MenuItem>
                      </TextField>
                    </Tooltip>
                  </TableCell>
                  <TableCell>
                    <Switch
                      checked={u.active}
                      disabled={me || update.isPending}
                      slotProps={{ input: { 'aria-label': `${u.name} can sign in` } }}
                      onChange={(e) => update.mutate({ id: u.id, changes: { active: e.target.checked } })}
                    />
                  </TableCell>
                  <TableCell align="right">
                    <Button
                      size="small"
                      disabled={!u.active || sendLink.isPending}
                      onClick={() => sendLink.mutate(u.id, { onSuccess: (r) => setNotice(`A password link is on its way to ${r.sentTo}. It works for an hour.`) })}
                    >
                      Send password link
                    </Button>
                  </TableCell>
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </TableContainer>
      <AddPersonDialog open={adding} onClose={() => setAdding(false)} />
      <Snackbar open={!!notice} autoHideDuration={6000} onClose={() => setNotice(null)} message={notice} />
    </>
  );
}
