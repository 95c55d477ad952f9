/** One run in the lab server's list, at its newest revision (GET /api/runs): the server and the phone share it. */
export interface LabRunItem {
  id: string;
  /** The newest revision, the one shown. */
  revision: number;
  revisions: number;
  title: string;
  startedAt: string;
  endedAt: string | null;
  device: string;
  components: string[];
  readingCount: number;
  /** Label of the token (phone) that sent the newest revision. */
  uploadedBy: string;
  receivedAt: string;
}
