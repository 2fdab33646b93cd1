import { FORMATS, MAX_DATA_ROWS, UPLOAD_FORMATS, type UploadFormat } from '../../../../shared/size-profiles/index';
import { api } from '@/config/paths';

export function FormatHelp({ format }: { format: UploadFormat }) {
  const info = FORMATS[format];
  return (
    <div className="rounded-md bg-paper-deep p-3 text-sm">
      <p className="font-semibold">
        {info.label}: header row <code className="rounded bg-white px-1">{info.columns.join(',')}</code>
      </p>
      <ul className="mt-2 list-disc space-y-1 pl-5 text-muted">
        {info.explain.map((line) => (
          <li key={line}>{line}</li>
        ))}
        <li>
          A comma-separated .csv file, UTF-8 text, 2 to {MAX_DATA_ROWS} data rows, at most 256 kB. Any problem stops the upload and lists
          every bad row and column.
        </li>
      </ul>
    </div>
  );
}

export function TemplateLinks() {
  return (
    <p className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
      <span className="text-muted">Download a template:</span>
      {UPLOAD_FORMATS.map((f) => (
        <a key={f} href={api.sizeProfileTemplate(f)} download className="font-semibold text-accent underline">
          {FORMATS[f].label} (.csv)
        </a>
      ))}
    </p>
  );
}
