import { PhotosBoard } from '@/components/upload/photos-board';
import { requirePageMember } from '@/lib/auth/current';
import { roleAtLeast } from '@/lib/auth/roles';

export const metadata = { title: 'Photos' };

export default async function PhotosPage() {
  const member = await requirePageMember();
  return (
    <section>
      <h1 className="text-2xl font-semibold">Photos</h1>
      <p className="mb-4 mt-1 text-ink-soft">Reference photos, test pours, batches and swatches of {member.team.name}. JPEG, PNG or WebP, up to 25 MB.</p>
      <PhotosBoard canUpload={roleAtLeast(member.role, 'maker')} />
    </section>
  );
}
