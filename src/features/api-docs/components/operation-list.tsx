import type { OpenApiDocument, Operation } from '../api/openapi';
import { SchemaView, typeLabel } from './schema-view';

type Schema = Record<string, unknown>;

const methodClass: Record<string, string> = {
  get: 'border-front text-front',
  post: 'border-clean text-clean',
  patch: 'border-partial text-partial',
  put: 'border-partial text-partial',
  delete: 'border-failed text-failed',
};

const roleText = (access: string | undefined) =>
  access === 'public' ? 'anyone' : access ? `${access} or above` : 'unknown';

function OperationItem({
  method,
  path,
  op,
  components,
}: {
  method: string;
  path: string;
  op: Operation;
  components: Record<string, Schema>;
}) {
  const body = op.requestBody ? Object.entries(op.requestBody.content)[0] : undefined;
  return (
    <li id={op.operationId} className="py-3">
      <details>
        <summary className="flex min-h-10 cursor-pointer flex-wrap items-center gap-2">
          <span
            className={`figure rounded-plate border px-1.5 text-xs font-semibold uppercase ${methodClass[method] ?? ''}`}
          >
            {method}
          </span>
          <span className="figure break-all text-sm text-ink">{path}</span>
          <span className="text-sm text-ink-soft">{op.summary}</span>
        </summary>
        <div className="mt-2 space-y-3 pl-1 text-sm">
          <p>
            <span className="font-medium">Who may call:</span> {roleText(op['x-rfolio-access'])}
          </p>
          {op.parameters && op.parameters.length > 0 && (
            <div>
              <h4 className="font-medium">Parameters</h4>
              <ul className="space-y-1 text-xs">
                {op.parameters.map((p) => (
                  <li key={`${p.in}-${p.name}`} className="break-words">
                    <span className="figure font-medium">{p.name}</span>{' '}
                    <span className="text-ink-soft">
                      ({p.in}
                      {p.required ? ', required' : ''})
                    </span>{' '}
                    <span className="figure text-ink-soft">{p.schema ? typeLabel(p.schema, components) : ''}</span>
                  </li>
                ))}
              </ul>
            </div>
          )}
          {body && (
            <div>
              <h4 className="font-medium">
                Request body <span className="figure text-xs font-normal text-ink-soft">{body[0]}</span>
              </h4>
              {body[1].schema && <SchemaView schema={body[1].schema} components={components} />}
            </div>
          )}
          <div>
            <h4 className="font-medium">Responses</h4>
            <ul className="space-y-2">
              {Object.entries(op.responses).map(([status, answer]) => {
                const [type, media] = Object.entries(answer.content ?? {})[0] ?? [];
                return (
                  <li key={status}>
                    <span className="figure font-medium">{status}</span>{' '}
                    <span className="text-ink-soft">{answer.description}</span>
                    {type && <span className="figure text-xs text-ink-soft"> ({type})</span>}
                    {media?.schema && /^2/.test(status) && <SchemaView schema={media.schema} components={components} />}
                  </li>
                );
              })}
            </ul>
          </div>
        </div>
      </details>
    </li>
  );
}

/** The document as operations grouped by tag, each folding open to its role, inputs and answers. */
export function OperationList({ doc }: { doc: OpenApiDocument }) {
  const components = (doc.components?.schemas ?? {}) as Record<string, Schema>;
  const groups = new Map<string, { method: string; path: string; op: Operation }[]>();
  for (const [path, item] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(item)) {
      const tag = op.tags?.[0] ?? 'Other';
      groups.set(tag, [...(groups.get(tag) ?? []), { method, path, op }]);
    }
  }
  return (
    <div className="space-y-6">
      {[...groups.entries()].map(([tag, ops]) => (
        <section key={tag} aria-label={tag}>
          <h2 className="text-lg font-semibold">{tag}</h2>
          <ul className="divide-y divide-line">
            {ops.map(({ method, path, op }) => (
              <OperationItem key={`${method} ${path}`} method={method} path={path} op={op} components={components} />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
