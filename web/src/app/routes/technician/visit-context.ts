import { useOutletContext } from 'react-router-dom';
import type { VisitSummary } from '@/features/visits/data/get-upcoming-visits';

/** What every section of a visit is given by the visit screen around it. */
export interface VisitContext {
  summary: VisitSummary;
  userId: string;
  userName: string;
  /** Signed off on site: the records are shown, not edited; later changes go to the office as conflicts. */
  locked: boolean;
}

export const useVisitContext = () => useOutletContext<VisitContext>();
