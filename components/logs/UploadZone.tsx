'use client';

import { useRef, useState, type DragEvent } from 'react';
import { ProgressMeter } from '@/components/ui/ProgressMeter';
import { LOG_EXTENSIONS, logFormatFromName, MAX_LOG_BYTES } from '@/lib/field-logs';
import { uploadLog, type UploadSummary } from './logs-api';

const MIB = 1024 * 1024;

/** What is wrong with a file before it is sent: its name or its size (the server checks both again, and the content). */
function fileProblem(file: { name: string; size: number }): string | null {
  if (logFormatFromName(file.name) === null) return `${file.name}: a field log must end in ${LOG_EXTENSIONS.join(', ')}.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > MAX_LOG_BYTES) return `${file.name} is ${(file.size / MIB).toFixed(1)} MiB; a log may be at most ${MAX_LOG_BYTES / MIB} MiB.`;
  return null;
}

/** Drop a log here or pick one; the share sent is shown while it goes up. */
export function UploadZone({ circuitId, onUploaded }: { circuitId: string; onUploaded: (upload: UploadSummary) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const [sending, setSending] = useState<{ name: string; share: number } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const send = (file: File) => {
    const refused = fileProblem(file);
    setProblem(refused);
    if (refused) return;
    setSending({ name: file.name, share: 0 });
    uploadLog(circuitId, file, (share) => setSending({ name: file.name, share }))
      .then((upload) => {
        setSending(null);
        onUploaded(upload);
      })
      .catch((error: unknown) => {
        setSending(null);
        setProblem(error instanceof Error ? error.message : 'The log could not be uploaded.');
      });
  };

  const onDrop = (e: DragEvent<HTMLDivElement>) => {
    e.preventDefault();
    setOver(false);
    const file = e.dataTransfer.files[0];
    if (file) send(file);
  };

  return (
    <div className="space-y-1">
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={onDrop}
        className={`flex flex-col items-center gap-2 rounded-lg border-2 border-dashed p-4 text-center text-sm ${over ? 'border-accent bg-accent-soft' : 'border-rule bg-paper-raised'}`}
        data-testid="log-drop"
      >
        <p className="text-ink">Drop a field log here ({LOG_EXTENSIONS.join(', ')}, up to {MAX_LOG_BYTES / MIB} MiB)</p>
        <label className="cursor-pointer rounded-md border border-rule bg-paper px-3 py-1 text-ink hover:border-accent">
          or choose a file
          <input
            ref={input}
            type="file"
            accept={LOG_EXTENSIONS.join(',')}
            className="sr-only"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) send(file);
              e.target.value = '';
            }}
            data-testid="log-file"
          />
        </label>
        <p className="text-xs text-ink-soft">The file is kept as it is, with its SHA-256; it is only ever read as data.</p>
      </div>
      {sending ? (
        <ProgressMeter done={Math.round(sending.share * 100)} total={100} label={`Uploading ${sending.name}`} testId="log-upload-progress">
          Uploading {sending.name}: {(sending.share * 100).toFixed(0)} %
        </ProgressMeter>
      ) : null}
      {problem ? (
        <p className="text-sm text-danger" role="alert" data-testid="log-upload-error">
          {problem}
        </p>
      ) : null}
    </div>
  );
}
