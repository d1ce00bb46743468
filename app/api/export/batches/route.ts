import { exportRoute } from '@/lib/csv/exportRoute';

// GET: the team's batches as a CSV file.
export const GET = exportRoute('batches');
