/** A number with at most `maxDecimals` decimals and no trailing zeros ("4", "3.7", "0.25"). */
export function formatNumber(value: number, maxDecimals = 2): string {
  const fixed = value.toFixed(maxDecimals);
  return fixed.includes('.') ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
}

/** Parts for display with two significant figures at most, never fewer than needed for whole numbers ("12", "3.7", "0.25"). */
export function formatParts(value: number): string {
  if (value >= 10) return formatNumber(Math.round(value), 0);
  if (value >= 1) return formatNumber(value, 1);
  return formatNumber(value, 2);
}
