/** The panels of a job (filled in with the panels feature). */
export function JobPanels(_props: { jobId: number; canEdit: boolean }) {
  return null;
}
