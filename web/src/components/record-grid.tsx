import Paper from '@mui/material/Paper';
import { DataGrid, type DataGridProps, type GridValidRowModel } from '@mui/x-data-grid';

/**
 * The office's tables: MUI X's data grid, paged on the server when `rowCount` is given, with our own filters above it
 * instead of the grid's column menus, and rows that grow to fit two lines.
 */
export function RecordGrid<R extends GridValidRowModel>({ label, ...props }: DataGridProps<R> & { label: string }) {
  const server = props.rowCount !== undefined;
  return (
    <Paper variant="outlined" sx={{ overflow: 'hidden' }}>
      <DataGrid<R>
        label={label}
        disableColumnFilter
        disableColumnMenu
        disableRowSelectionOnClick
        disableColumnSelector
        disableDensitySelector
        getRowHeight={() => 'auto'}
        pageSizeOptions={[25, 50, 100]}
        paginationMode={server ? 'server' : 'client'}
        sx={{
          border: 0,
          '& .MuiDataGrid-cell': { py: 1, display: 'flex', alignItems: 'center' },
          '& .MuiDataGrid-columnHeaderTitle': { fontWeight: 500 },
        }}
        {...props}
      />
    </Paper>
  );
}
