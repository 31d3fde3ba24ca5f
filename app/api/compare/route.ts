import { routeHandler } from '@/lib/auth/adapters';
import { listComparisonPage } from '@/lib/comparison/list-comparison-page';

/** GET /api/compare?<filters>&sort=&dir=&page=&pageSize= → { ok, data: { rows, total, page, pageSize } } */
export const GET = routeHandler(listComparisonPage, { input: 'query' });
