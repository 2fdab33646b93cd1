import { useState, type FormEvent } from 'react';
import { FORMATS, UPLOAD_FORMATS, type UploadFormat } from '../../../../shared/size-profiles/index';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { ApiError } from '@/lib/api-client';
import { useUploadSizeProfile } from '@/features/size-profiles/api/upload-size-profile';
import { FormatHelp, TemplateLinks } from './format-help';

type FileIssue = { path: string; message: string; row?: number | null; column?: string | null };

export function UploadForm() {
  const [format, setFormat] = useState<UploadFormat>('impactor');
  const [name, setName] = useState('');
  const [file, setFile] = useState<File | null>(null);
  const [density, setDensity] = useState('');
  const [confirmed, setConfirmed] = useState(false);
  const upload = useUploadSizeProfile();
  const needsDensity = format === 'counter';
  const density_kgPerM3 = density.trim() === '' ? undefined : Number(density);
  const ready = name.trim() !== '' && file !== null && (!needsDensity || (density_kgPerM3 !== undefined && confirmed));
  const issues = upload.error instanceof ApiError ? (upload.error.issues as FileIssue[]) : [];

  function submit(e: FormEvent) {
    e.preventDefault();
    if (!file) return;
    upload.mutate({ file, format, name: name.trim(), density_kgPerM3, densityConfirmed: confirmed });
  }

  return (
    <form onSubmit={submit} noValidate aria-label="Upload a size profile" className="space-y-4 rounded-lg border border-line bg-white p-4">
      <h2 className="text-lg font-semibold">Upload measured sizes</h2>
      <div className="grid gap-4 sm:grid-cols-3">
        <SelectField label="Format" value={format} onChange={(e) => setFormat(e.target.value as UploadFormat)}>
          {UPLOAD_FORMATS.map((f) => (
            <option key={f} value={f}>
              {FORMATS[f].label}
            </option>
          ))}
        </SelectField>
        <TextField label="Name" value={name} onChange={(e) => setName(e.target.value)} maxLength={120} />
        <TextField label="CSV file" type="file" accept=".csv,text/csv" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
      </div>
      <FormatHelp format={format} />
      {needsDensity && (
        <div className="grid gap-3 sm:grid-cols-[16rem_1fr] sm:items-end">
          <TextField
            label="Particle density"
            unit="kg/m³"
            inputMode="decimal"
            value={density}
            onChange={(e) => setDensity(e.target.value)}
            hint="e.g. 2650 for quartz, 1500 for flour"
          />
          <label className="flex items-start gap-2 text-sm">
            <input type="checkbox" checked={confirmed} onChange={(e) => setConfirmed(e.target.checked)} className="mt-1" />
            <span>
              I confirm this density applies to the counted particles; it turns counts into mass and sizes into aerodynamic diameters.
            </span>
          </label>
        </div>
      )}
      <div className="flex flex-wrap items-center justify-between gap-3">
        <TemplateLinks />
        <Button type="submit" disabled={!ready || upload.isPending}>
          {upload.isPending ? 'Uploading…' : 'Upload and fit'}
        </Button>
      </div>
      {upload.isSuccess && <Notice>Stored “{upload.data.name}”.</Notice>}
      {upload.error && <ErrorMessage title="Not stored" error={upload.error} />}
      {issues.length > 0 && (
        <ul aria-label="Problems in the file" className="list-disc space-y-1 pl-5 text-sm text-act">
          {issues.map((i, k) => (
            <li key={k}>
              {i.row ? `Row ${i.row}` : i.path === 'file' ? 'File' : i.path.replace(/^body\./, '')}
              {i.column ? `, ${i.column}` : ''}: {i.message}
            </li>
          ))}
        </ul>
      )}
    </form>
  );
}
