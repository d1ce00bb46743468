/**
 * The k-th smallest of `values` (k from 0), by quickselect (C. A. R. Hoare, "Algorithm 65: Find",
 * CACM 4(7), 1961): linear time on average where a sort is n log n. Works on a copy held in
 * `work` (at least values.length long; allocated when omitted), so `values` keeps its order.
 */
export function kthSmallest(values: Float64Array, k: number, work: Float64Array = new Float64Array(values.length)): number {
  const a = work.subarray(0, values.length);
  a.set(values);
  let lo = 0, hi = a.length - 1;
  while (lo < hi) {
    const pivot = a[(lo + hi) >> 1];
    let i = lo, j = hi;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        const t = a[i];
        a[i++] = a[j];
        a[j--] = t;
      }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else break;
  }
  return a[k];
}
