import { db } from '@/db';
import { getTeamSettings } from '@/db/queries/teams';
import { DeltaCheck } from '@/components/calculator/delta-check';
import { PhotoCheck } from '@/components/calculator/photo-check';
import { RecipeScaler } from '@/components/calculator/recipe-scaler';
import { requirePageMember } from '@/lib/auth/current';

export const metadata = { title: 'Calculator' };

export default async function CalculatorPage() {
  const member = await requirePageMember();
  const settings = getTeamSettings(db(), member.team.id);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Calculator</h1>
        <p className="mt-1 text-ink-soft">Check a colour from any photo, compare two colours, or scale a recipe to a batch and a mold.</p>
      </div>
      <PhotoCheck />
      <DeltaCheck tolerance={settings?.defaultTolerance ?? 2} />
      <RecipeScaler dropsPerMl={settings?.dropsPerMl ?? 20} sprueAllowanceMl={settings?.sprueAllowanceMl ?? 0} volumeUnit={settings?.volumeUnit ?? 'cups'} />
    </div>
  );
}
