import { exportRoute } from '@/lib/csv/exportRoute';

// GET: the team's colorants as a CSV file.
export const GET = exportRoute('colorants');
