import { PageLoading } from '../components/ui/page-loading';
import { Card } from '../components/ui/card';
import { useOpenApiDocument } from '../features/api-docs/api/openapi';
import { OperationList } from '../features/api-docs/components/operation-list';

/** The JSON API reference, rendered from GET /api/openapi.json (the document the server generates). */
export default function ApiReferencePage() {
  const { data, error } = useOpenApiDocument();
  if (error)
    return (
      <p role="alert" className="text-failed">
        Could not load the API document: {error.message}
      </p>
    );
  if (!data) return <PageLoading />;
  const count = Object.values(data.paths).reduce((n, item) => n + Object.keys(item).length, 0);
  return (
    <section className="max-w-4xl space-y-6">
      <header>
        <h1 className="text-2xl font-semibold">API reference</h1>
        <p className="mt-1 text-sm text-ink-soft">
          {count} operations of {data.info.title} {data.info.version}. The machine-readable document (OpenAPI{' '}
          {data.openapi}) is at{' '}
          <a className="figure text-front underline" href="/api/openapi.json">
            /api/openapi.json
          </a>
          .
        </p>
      </header>
      <Card title="Calling it from a script">
        <div className="space-y-2 text-sm">
          <p>
            Create a personal API token on your profile page and send it as{' '}
            <code className="figure">Authorization: Bearer &lt;token&gt;</code>: no cookie and no CSRF token are needed.
            A token acts with your current role, or only reads when it is read-only.
          </p>
          <pre className={'figure overflow-x-auto rounded-plate bg-plate ' + 'p-3 text-xs'}>
            {`curl -H "Authorization: ` + `Bearer $RFOLIO_TOKEN" ${window.location.origin}/api/export.csv`}
          </pre>
          <p>Every failure answers {'{ "error": { "code", "message", "details"? } }'}.</p>
        </div>
      </Card>
      <OperationList doc={data} />
    </section>
  );
}
