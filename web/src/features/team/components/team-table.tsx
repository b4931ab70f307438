import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import FormHelperText from '@mui/material/FormHelperText';
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

type Refused = { id: string; what: 'role' | 'active' | 'link'; message: string };

const ROLE_WORDS: Record<Role, string> = { technician: 'a technician', office: 'office staff', admin: 'an admin' };

/** The admin's view of everyone who signs in: role, active or not, and a password link when someone is locked out. */
export function TeamTable() {
  const session = useSession();
  const users = useUsers();
  const update = useUpdatePerson();
  const sendLink = useSendPasswordLink();
  const [adding, setAdding] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const [failure, setFailure] = useState<Refused | null>(null);
  // A change to who may do what is asked about first, then said done.
  const [asking, setAsking] = useState<{ id: string; changes: { role?: Role; active?: boolean }; question: string; done: string } | null>(null);
  if (users.isPending) return <LinearProgress aria-label="Loading the team" />;
  if (users.isError) return <Alert severity="error">{users.error.message}</Alert>;
  // A refusal is shown beside the person and the control it is about, not in a banner above everyone.
  const refusedFor = (id: string, what: Refused['what']) => (failure?.id === id && failure.what === what ? failure.message : undefined);
  return (
    <>
      <Stack direction="row" sx={{ justifyContent: 'flex-end', mb: 2 }}>
        <Button variant="contained" onClick={() => setAdding(true)}>
          Add a person
        </Button>
      </Stack>
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
                        error={!!refusedFor(u.id, 'role')}
                        helperText={refusedFor(u.id, 'role')}
                        onChange={(e) => {
                          const role = e.target.value as Role;
                          setAsking({ id: u.id, changes: { role }, question: `Make ${u.name} ${ROLE_WORDS[role]}?`, done: `${u.name} is now ${ROLE_WORDS[role]}.` });
                        }}
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
                      slotProps={{ input: { 'aria-label': `${u.name} can sign in`, 'aria-describedby': refusedFor(u.id, 'active') ? `active-refused-${u.id}` : undefined } }}
                      onChange={(e) =>
                        setAsking(
                          e.target.checked
                            ? { id: u.id, changes: { active: true }, question: `Let ${u.name} sign in again?`, done: `${u.name} can sign in again.` }
                            : { id: u.id, changes: { active: false }, question: `Stop ${u.name} signing in?`, done: `${u.name} can no longer sign in. Their records stay as they are.` },
                        )
                      }
                    />
                    {refusedFor(u.id, 'active') && (
                      <FormHelperText error id={`active-refused-${u.id}`} role="alert">
                        {refusedFor(u.id, 'active')}
                      </FormHelperText>
                    )}
                  </TableCell>
                  <TableCell align="right">
                    <Button
                      size="small"
                      disabled={!u.active || sendLink.isPending}
                      onClick={() => {
                        setFailure(null);
                        sendLink.mutate(u.id, {
                          onSuccess: (r) => setNotice(`A password link is on its way to ${r.sentTo}. It works for an hour.`),
                          onError: (err) => setFailure({ id: u.id, what: 'link', message: `Password link not sent: ${err.message}` }),
                        });
                      }}
                    >
                      Send password link
                    </Button>
                    {refusedFor(u.id, 'link') && (
                      <FormHelperText error role="alert" sx={{ textAlign: 'right' }}>
                        {refusedFor(u.id, 'link')}
                      </FormHelperText>
                    )}
                  </TableCell>
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </TableContainer>
      <AddPersonDialog open={adding} onClose={() => setAdding(false)} />
      <Dialog open={!!asking} onClose={() => setAsking(null)} aria-labelledby="team-change-title">
        <DialogTitle id="team-change-title">{asking?.question}</DialogTitle>
        <DialogContent>{asking?.changes.active === false ? 'They are signed out at their next request, on every device; what they recorded stays.' : 'It takes effect at their next request.'}</DialogContent>
        <DialogActions>
          <Button onClick={() => setAsking(null)}>Leave it</Button>
          <Button
            variant="contained"
            disabled={update.isPending}
            onClick={() => {
              const a = asking!;
              setFailure(null);
              update.mutate(
                { id: a.id, changes: a.changes },
                {
                  onSuccess: () => setNotice(a.done),
                  onError: (err) => setFailure({ id: a.id, what: a.changes.role ? 'role' : 'active', message: `${a.changes.role ? 'Role' : 'Signing in'} not changed: ${err.message}` }),
                },
              );
              setAsking(null);
            }}
          >
            Yes, change it
          </Button>
        </DialogActions>
      </Dialog>
      <Snackbar open={!!notice} autoHideDuration={6000} onClose={() => setNotice(null)} message={notice} />
    </>
  );
}
