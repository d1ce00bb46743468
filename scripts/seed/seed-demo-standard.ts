import { and, eq } from 'drizzle-orm';
import { getMemberByUserId } from '../../db/queries/members';
import type { DB } from '../../db/open';
import { colorants, matches, molds, pours, users } from '../../db/schema';
import { logBatch } from '../../lib/batches/logBatch';
import { addPour } from '../../lib/matches/addPour';
import { setTarget } from '../../lib/matches/setTarget';
import { signOffPour } from '../../lib/signoff/signOffPour';
import { submitPour } from '../../lib/signoff/submitPour';
import { savePhotoBytes } from '../../lib/uploads/savePhoto';
import { baitPhoto, CARD, rgb8, ZONES } from './seed-demo-pours';

// The demo's approved colour: "Pond ghost" poured twice, the second pour signed
// off by the lead as the standard, then two production batches checked against
// it — one within tolerance, one that drifted. Invented colours throughout.
const TARGET = { back: rgb8(72.4, -3.1, 6.2), belly: rgb8(84, -1.2, 3.5) };
const POURS = [
  { back: rgb8(69, -4.5, 9), belly: rgb8(82.5, -1.5, 5), silver: 0.25, green: 1 },
  { back: rgb8(72, -3.3, 6.6), belly: rgb8(83.7, -1.3, 3.8), silver: 0.375, green: 0.5 },
];
const BATCHES = [
  { back: rgb8(72.3, -3.2, 6.4), belly: rgb8(83.9, -1.2, 3.6), cups: 8, baits: 132 },
  { back: rgb8(68.5, -2, 11), belly: rgb8(82, -0.5, 6.5), cups: 8, baits: 128 },
];

export async function seedDemoStandard(database: DB, teamId: string, baseUrl: string): Promise<boolean> {
  const match = database.select().from(matches).where(and(eq(matches.teamId, teamId), eq(matches.name, 'Pond ghost'))).get();
  if (!match || database.select({ id: pours.id }).from(pours).where(eq(pours.matchId, match.id)).get()) return false;
  const memberOf = (email: string) => getMemberByUserId(database, database.select({ id: users.id }).from(users).where(eq(users.email, email)).get()!.id)!;
  const maker = memberOf('maker@demo.test');
  const lead = memberOf('lead@demo.test');
  const col = (name: string) => database.select({ id: colorants.id }).from(colorants).where(and(eq(colorants.teamId, teamId), eq(colorants.name, name))).get()!.id;
  const mold = database.select({ id: molds.id }).from(molds).where(and(eq(molds.teamId, teamId), eq(molds.name, 'Paddle swimbait 4.5 in, 2 cavity'))).get()?.id;
  const photo = async (kind: 'reference' | 'pour' | 'batch', colours: { back: [number, number, number]; belly: [number, number, number] }, seed: number, name: string) =>
    (await savePhotoBytes(database, { teamId, userId: maker.user.id, kind }, await baitPhoto(colours.back, colours.belly, seed, null), name)).photoId;

  await setTarget(database, maker, match.id, { photoId: await photo('reference', TARGET, 100, 'pond-ghost-reference.jpg'), zones: ZONES, neutral: CARD });
  let last = '';
  for (const [i, p] of POURS.entries()) {
    last = await addPour(database, maker, match.id, {
      photoId: await photo('pour', p, 110 + i, `pond-ghost-pour-${i + 1}.jpg`),
      recipe: [
        { zone: 'back', colorantId: col('Pearl, fine silver'), amount: p.silver, unit: 'tsp' },
        { zone: 'back', colorantId: col('Pigment, reed green'), amount: p.green, unit: 'drops' },
        { zone: 'belly', colorantId: col('Pearl, fine silver'), amount: 0.5, unit: 'tsp' },
      ],
      moldId: mold,
      batchCups: 1,
      tempF: 330,
      notes: i === 0 ? 'Too green and too dark in the back.' : 'More pearl, half the green.',
      zones: ZONES,
      neutral: CARD,
    });
  }
  submitPour(database, maker, last, { note: 'Shot under the bench lamp with the grey card.' }, baseUrl);
  signOffPour(database, lead, last, { decision: 'approved', comment: 'Good for the spring run.' }, baseUrl);
  for (const [i, b] of BATCHES.entries()) {
    await logBatch(database, maker, match.id, {
      photoId: await photo('batch', b, 120 + i, `pond-ghost-batch-${i + 1}.jpg`),
      zones: ZONES,
      neutral: CARD,
      cups: b.cups,
      moldId: mold,
      baits: b.baits,
      notes: i === 1 ? 'New drum of base plastisol.' : undefined,
    }, baseUrl);
  }
  return true;
}
