import Alert from '@mui/material/Alert';
import Chip from '@mui/material/Chip';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { useUsers } from '../api/get-users';

const ROLE_LABEL = { admin: 'Admin', office: 'Office', technician: 'Technician' } as const;

export function TeamTable() {
  const users = useUsers();
  if (users.isPending) return <LinearProgress aria-label="Loading the team" />;
  if (users.isError) return <Alert severity="error">{users.error.message}</Alert>;
  return (
    <TableContainer component={Paper} variant="outlined">
      <Table aria-label="Team">
        <TableHead>
          <TableRow>
            <TableCell>Name</TableCell>
            <TableCell>E-mail</TableCell>
            <TableCell>Role</TableCell>
            <TableCell>Status</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {users.data.items.map((u) => (
            <TableRow key={u.id}>
              <TableCell>{u.name}</TableCell>
              <TableCell>{u.email}</TableCell>
              <TableCell>{ROLE_LABEL[u.role]}</TableCell>
              <TableCell>
                <Chip size="small" label={u.active ? 'Active' : 'Deactivated'} color={u.active ? 'success' : 'default'} variant="outlined" />
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
