import { Component, lazy, Suspense, type ReactNode } from 'react';

/** Its own chunk: OpenChemLib (~1.1 MB) loads only when someone opens the drawing tab. */
const OclEditor = lazy(() => import('./ocl-editor'));

class EditorLoadBoundary extends Component<{ children: ReactNode }, { failed: boolean }> {
  state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  render() {
    if (this.state.failed) {
      return (
        <p role="alert" className="p-4 text-sm text-failed">
          The drawing editor could not load (network or browser problem). Paste a SMILES or molfile instead, or reload
          the page.
        </p>
      );
    }
    return this.props.children;
  }
}

interface DrawPanelProps {
  value: string;
  onChange: (molfile: string) => void;
  labelledBy: string;
}

/** The drawing tab: a fixed-height, touch-friendly area holding the lazily loaded editor. */
export function DrawPanel({ value, onChange, labelledBy }: DrawPanelProps) {
  return (
    <div className="h-[26rem] w-full overflow-hidden rounded-plate border border-line bg-surface">
      <EditorLoadBoundary>
        <Suspense
          fallback={
            <p className="p-4 text-sm text-ink-soft" role="status">
              Loading the drawing editor…
            </p>
          }
        >
          <OclEditor value={value} onChange={onChange} labelledBy={labelledBy} />
        </Suspense>
      </EditorLoadBoundary>
    </div>
  );
}
