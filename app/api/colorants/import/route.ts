import { importColorants } from '@/lib/csv/importLibrary';
import { importRoute } from '@/lib/csv/importRoute';

export const POST = importRoute('colorant', importColorants);
