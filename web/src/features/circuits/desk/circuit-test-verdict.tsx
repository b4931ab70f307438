import Typography from '@mui/material/Typography';
import { useJobTestResults } from '../api/get-test-results';
import { overallResult } from '../overall-result';
import { VerdictChip } from '@/components/verdicts/verdict-chip';

/** A circuit's overall verdict from its latest test on the job, for a column of the site's circuits. */
export function CircuitTestVerdict({ jobId, circuitId, circuitLabel }: { jobId: string; circuitId: string; circuitLabel: string }) {
  const results = useJobTestResults(jobId);
  const mine = (results.data?.items ?? []).filter((r) => r.circuitId === circuitId);
  const latest = mine.at(-1);
  if (!latest) return <Typography variant="body2" color="text.secondary">{results.isPending ? '…' : 'Not tested on this job'}</Typography>;
  return <VerdictChip what={`${circuitLabel}: all tests`} result={overallResult(latest.assessment)} size="small" />;
}
