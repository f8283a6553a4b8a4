import { archiveSite, getSite, updateSite } from '@/lib/data/sites';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordItem } from '@/lib/routes/records';
import { sitePatchSchema } from '@/lib/validation/sites';

const routes = recordItem({
  kind: 'site',
  what: 'Site',
  patchSchema: sitePatchSchema,
  get: getSite,
  update: updateSite,
  archive: archiveSite,
  writers: DESK_ROLES,
});
/** The site with its customer, access points and segments. */
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives the site when segments or jobs depend on it, deletes it otherwise. */
export const DELETE = routes.DELETE;
