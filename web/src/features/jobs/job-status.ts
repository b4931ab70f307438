const JOB_STATUS_WORDS: Record<string, string> = {
  enquiry: 'Enquiry',
  booked: 'Booked',
  'on-site': 'On site',
  paperwork: 'Paperwork',
  done: 'Done',
  cancelled: 'Cancelled',
};

export const jobStatusWords = (status: string | null | undefined) => (status ? (JOB_STATUS_WORDS[status] ?? status) : '—');
