import { exportRoute } from '@/lib/csv/exportRoute';

// GET: the team's molds as a CSV file.
export const GET = exportRoute('molds');
