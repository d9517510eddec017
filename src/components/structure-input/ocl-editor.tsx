import { useEffect, useRef, useState } from 'react';
import { CanvasEditor, Molecule } from 'openchemlib';
import { looksLikeMolfile } from './structure-text';

/** The editor's structure as text: a V2000 molfile keeps the drawing (and its chiral flag); empty when nothing is drawn. */
function toText(mol: Molecule): string {
  return mol.getAllAtoms() === 0 ? '' : mol.toMolfile();
}

/** Text to molecule for display only; the server remains the judge of validity. */
function toMolecule(text: string): Molecule | null {
  if (!text.trim()) return new Molecule(0, 0);
  try {
    const mol = looksLikeMolfile(text) ? Molecule.fromMolfile(text) : Molecule.fromSmiles(text.trim().split(/\s+/)[0]);
    return mol.getAllAtoms() > 0 ? mol : null;
  } catch {
    return null;
  }
}

interface OclEditorProps {
  value: string;
  onChange: (molfile: string) => void;
  labelledBy: string;
}

/**
 * OpenChemLib's drawing editor. This module is the only client code importing `openchemlib`, and it
 * is loaded lazily, so the library stays out of the first-load bundle.
 */
export default function OclEditor({ value, onChange, labelledBy }: OclEditorProps) {
  const host = useRef<HTMLDivElement>(null);
  const editor = useRef<CanvasEditor | null>(null);
  const emitted = useRef<string | null>(null);
  const onChangeRef = useRef(onChange);
  onChangeRef.current = onChange;
  const [undrawable, setUndrawable] = useState(false);

  useEffect(() => {
    const instance = new CanvasEditor(host.current!, { initialMode: 'molecule' });
    editor.current = instance;
    instance.setOnChangeListener(({ type, isUserEvent }) => {
      if (type !== 'molecule' || !isUserEvent) return;
      const text = toText(instance.getMolecule());
      emitted.current = text;
      setUndrawable(false);
      onChangeRef.current(text);
    });
    return () => {
      instance.destroy();
      editor.current = null;
      emitted.current = null;
    };
  }, []);

  useEffect(() => {
    const instance = editor.current;
    if (!instance || value === emitted.current) return;
    const mol = toMolecule(value);
    setUndrawable(mol === null);
    if (mol) instance.setMolecule(mol);
    emitted.current = value;
  }, [value]);

  return (
    <div className="relative h-full w-full">
      <div
        ref={host}
        role="application"
        aria-labelledby={labelledBy}
        aria-roledescription="structure drawing editor"
        className="h-full w-full"
      />
      {undrawable && (
        <p className="absolute inset-x-2 bottom-2 rounded-plate bg-surface/95 p-2 text-xs text-ink-soft shadow-sm">
          The text in Paste cannot be drawn as it stands; the check below says why. Drawing here replaces it.
        </p>
      )}
    </div>
  );
}
