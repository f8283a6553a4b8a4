import { createJob, listJobs } from '@/lib/data/jobs';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordCollection } from '@/lib/routes/records';
import { jobInputSchema, jobListQuerySchema } from '@/lib/validation/jobs';

/** A page of jobs, or with `?format=csv` every job the same filter matches. */
const routes = recordCollection({
  csvName: 'jobs',
  writers: DESK_ROLES,
  querySchema: jobListQuerySchema,
  inputSchema: jobInputSchema,
  list: listJobs,
  create: createJob,
  csv: [
    { header: 'Number', value: (j) => j.number },
    { header: 'Title', value: (j) => j.title },
    { header: 'Customer', value: (j) => j.customer?.name },
    { header: 'Site', value: (j) => j.site?.addressLine },
    { header: 'City', value: (j) => j.site?.city },
    { header: 'Status', value: (j) => label(j.status) },
    { header: 'Scheduled', value: (j) => j.scheduledDate },
    { header: 'Crew', value: (j) => j.crew?.name },
    { header: 'Archived', value: (j) => (j.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
