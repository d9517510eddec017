/** A hit's score with where it comes from: Tanimoto similarity for structures, text match for words. */
export function Score({ similarity, relevance }: { similarity: number | null; relevance: number | null }) {
  if (similarity !== null) {
    return (
      <span
        className="figure text-sm"
        title="Tanimoto similarity to the query structure (OpenChemLib 512-bit fingerprints; 1 = same fingerprint)"
      >
        {similarity.toFixed(2)}
        <span className="sr-only"> Tanimoto similarity</span>
      </span>
    );
  }
  if (relevance !== null) {
    return (
      <span className="figure text-xs text-ink-soft" title="How closely the words match (1 − Fuse.js score; 1 = exact)">
        match {relevance.toFixed(2)}
      </span>
    );
  }
  return <span className="text-ink-soft">—</span>;
}
