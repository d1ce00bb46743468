import { exportRoute } from '@/lib/csv/exportRoute';

// GET: the team's standards as a CSV file.
export const GET = exportRoute('standards');
