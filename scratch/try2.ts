import { deltaE2000 } from '@/lib/color';
import { measurePhoto } from '@/lib/image';
import { makePhoto } from '../tests/support/photoGen';
async function main() {
  const b = {l:35,a:5,b:-25};
  for (const fmt of ['png','jpeg90'] as const) for (const blur of [0, 0.6]) {
  const p = await makePhoto({ seed: 1, base: b, flake: { colours: [{l:35,a:15,b:-60}], coverage: 0.2, sizes: [1,3] }, blur, format: fmt });
  const m = (await measurePhoto(p.file, [{ name: 'r', shape: p.region }])).regions[0];
  console.log(fmt, blur, 'dE', deltaE2000(m.lab, p.lab).toFixed(2), JSON.stringify(m.lab), JSON.stringify(p.lab), JSON.stringify({ ...m, hex: 0 }));
  }
}
main();
