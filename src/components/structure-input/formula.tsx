/** A molecular formula with its counts as subscripts and charges as superscripts (C9H8O4 → C₉H₈O₄). */
export function Formula({ formula }: { formula: string }) {
  const parts = formula.match(/[A-Z][a-z]?|\d+|[+-]\d*|[^A-Za-z\d+-]+/g) ?? [formula];
  return (
    <span aria-label={formula} className="figure">
      {parts.map((p, i) =>
        /^\d+$/.test(p) ? <sub key={i}>{p}</sub> : /^[+-]/.test(p) ? <sup key={i}>{p}</sup> : <span key={i}>{p}</span>,
      )}
    </span>
  );
}
