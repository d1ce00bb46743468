import { generateReactHelpers } from '@uploadthing/react';
import type { PhotoRouter } from '@/lib/uploads/router';

// Typed client helpers for the app's file router at /api/uploadthing.
export const { useUploadThing } = generateReactHelpers<PhotoRouter>({ url: '/api/uploadthing' });
