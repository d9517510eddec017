type Schema = Record<string, unknown>;

const MAX_DEPTH = 6;

function resolve(schema: Schema, components: Record<string, Schema>): { schema: Schema; name?: string } {
  const ref = typeof schema.$ref === 'string' ? schema.$ref : undefined;
  const name = ref?.split('/').pop();
  return name && components[name] ? { schema: { ...components[name], ...schema, $ref: undefined }, name } : { schema };
}

/** A one-line type of a schema: `string`, `integer ≥ 1`, `"a" | "b"`, `array of object`, `Record` … */
export function typeLabel(raw: Schema, components: Record<string, Schema>): string {
  const { schema, name } = resolve(raw, components);
  if (Array.isArray(schema.enum)) return schema.enum.map((v) => JSON.stringify(v)).join(' | ');
  if (schema.const !== undefined) return JSON.stringify(schema.const);
  const variants = (schema.anyOf ?? schema.oneOf) as Schema[] | undefined;
  if (variants) return variants.map((v) => typeLabel(v, components)).join(' | ');
  const type = Array.isArray(schema.type) ? schema.type.join(' | ') : (schema.type as string | undefined);
  if (type === 'array') return `array of ${schema.items ? typeLabel(schema.items as Schema, components) : 'anything'}`;
  // zod's int() bounds (±(2^53 − 1)) say nothing to a reader.
  const shown = (v: unknown) => typeof v === 'number' && Math.abs(v) < Number.MAX_SAFE_INTEGER;
  const bounds = [
    shown(schema.minimum) && `≥ ${schema.minimum}`,
    shown(schema.exclusiveMinimum) && `> ${schema.exclusiveMinimum}`,
    shown(schema.maximum) && `≤ ${schema.maximum}`,
    schema.maxLength !== undefined && `≤ ${schema.maxLength} chars`,
    typeof schema.format === 'string' && schema.format,
  ].filter(Boolean);
  return [name ?? type ?? 'any', ...bounds].join(' ');
}

/** The properties of an object schema as a nested list (required ones marked), folding deep levels. */
export function SchemaView({
  schema: raw,
  components,
  depth = 0,
}: {
  schema: Schema;
  components: Record<string, Schema>;
  depth?: number;
}) {
  const { schema } = resolve(raw, components);
  const items =
    schema.type === 'array' && schema.items ? resolve(schema.items as Schema, components).schema : undefined;
  const target = items ?? schema;
  const properties = target.properties as Record<string, Schema> | undefined;
  if (!properties || depth > MAX_DEPTH)
    return <p className="figure text-xs text-ink-soft">{typeLabel(raw, components)}</p>;
  const required = new Set((target.required as string[] | undefined) ?? []);
  return (
    <ul className={`space-y-1 text-xs ${depth ? 'ml-3 border-l border-line pl-2' : ''}`}>
      {items && <li className="text-ink-soft">an array, each item:</li>}
      {Object.entries(properties).map(([key, prop]) => {
        const inner = resolve(prop, components).schema;
        const nested = Boolean(
          inner.properties ||
          (inner.type === 'array' && resolve((inner.items as Schema) ?? {}, components).schema.properties),
        );
        return (
          <li key={key} className="break-words">
            <span className="figure font-medium text-ink">{key}</span>
            {required.has(key) ? '' : <span className="text-ink-soft">?</span>}{' '}
            <span className="figure text-ink-soft">{typeLabel(prop, components)}</span>
            {typeof inner.description === 'string' && <span className="text-ink-soft"> — {inner.description}</span>}
            {nested && (
              <details className="mt-1">
                <summary className="min-h-6 cursor-pointer text-front">fields</summary>
                <SchemaView schema={prop} components={components} depth={depth + 1} />
              </details>
            )}
          </li>
        );
      })}
    </ul>
  );
}
