'use client';

import dynamic from 'next/dynamic';

// The sign-off queue on the Matches page, for leads and owners: its code (and SWR's) loads
// only where it is shown, so a maker's Matches list stays light.
export const LeadQueue = dynamic(() => import('./signoff-queue').then((m) => m.SignOffQueue));
