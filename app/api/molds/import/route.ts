import { importMolds } from '@/lib/csv/importLibrary';
import { importRoute } from '@/lib/csv/importRoute';

export const POST = importRoute('mold', importMolds);
