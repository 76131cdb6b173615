import { Button, Dialog, Flex, Progress, Text } from '@radix-ui/themes';
import { useCallback, useRef, useState } from 'react';
import { SOCKET_EVENTS, type UploadPreview, type UploadProgressEvent } from '@upwell/common';
import { discardUpload, uploadFile } from '../../api/uploads';
import { ErrorNote } from '../../components/ErrorNote';
import { useSocketEvent } from '../../realtime/socket';
import { ImportMapping } from './ImportMapping';

type Stage = { step: 'choose' } | { step: 'sending'; fraction: number } | { step: 'preview'; preview: UploadPreview } | { step: 'done'; message: string };

/** Upload a CSV or NetCDF file: send it with progress, see what it holds, map it to series, import. */
export function UploadDialog({ groupId }: { groupId: string }) {
  const [open, setOpen] = useState(false);
  const [stage, setStage] = useState<Stage>({ step: 'choose' });
  const [processing, setProcessing] = useState<UploadProgressEvent | null>(null);
  const [error, setError] = useState<unknown>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const abort = useRef<AbortController | null>(null);

  useSocketEvent<UploadProgressEvent>(SOCKET_EVENTS.uploadProgress, useCallback((e) => setProcessing(e), []));

  async function send(file: File) {
    setError(null);
    setProcessing(null);
    abort.current = new AbortController();
    setStage({ step: 'sending', fraction: 0 });
    try {
      const preview = await uploadFile(groupId, file, (fraction) => setStage({ step: 'sending', fraction }), abort.current.signal);
      setStage({ step: 'preview', preview });
    } catch (err) {
      setError(err);
      setStage({ step: 'choose' });
    }
  }

  function close(next: boolean) {
    if (!next) {
      abort.current?.abort();
      if (stage.step === 'preview') void discardUpload(stage.preview.uploadId).catch(() => {});
      setStage({ step: 'choose' });
      setError(null);
    }
    setOpen(next);
  }

  return (
    <Dialog.Root open={open} onOpenChange={close}>
      <Dialog.Trigger>
        <Button size="3">Upload series</Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth={stage.step === 'preview' ? '1100px' : '560px'}>
        <Dialog.Title>Upload series</Dialog.Title>
        {stage.step === 'choose' && (
          <Flex direction="column" gap="3">
            <Dialog.Description size="2" color="gray">
              A CSV or text table (a date column with value columns, or a year column with twelve month columns), or a NetCDF file with a
              time axis. You will see what was read, and choose what to store, before anything is saved.
            </Dialog.Description>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                File
              </Text>
              <input ref={fileInput} type="file" accept=".csv,.txt,.tsv,.dat,.nc,.nc4,.cdf" aria-label="File to upload" onChange={(e) => e.target.files?.[0] && send(e.target.files[0])} />
            </label>
            <ErrorNote error={error} action="Check the file, or set the reading options, and upload it again." />
          </Flex>
        )}
        {stage.step === 'sending' && (
          <Flex direction="column" gap="2" role="status" aria-live="polite">
            <Text size="2">{stage.fraction < 1 ? `Sending… ${Math.round(stage.fraction * 100)}%` : processing?.phase === 'parsing' && processing.fraction !== null ? `Reading the file… ${Math.round(processing.fraction * 100)}%` : 'Reading the file…'}</Text>
            <Progress aria-label="Upload progress" value={Math.round((stage.fraction < 1 ? stage.fraction : processing?.fraction ?? 1) * 100)} max={100} />
            <Button variant="soft" color="gray" onClick={() => abort.current?.abort()} style={{ alignSelf: 'start' }}>
              Cancel
            </Button>
          </Flex>
        )}
        {stage.step === 'preview' && (
          <ImportMapping
            groupId={groupId}
            preview={stage.preview}
            onDone={(message) => setStage({ step: 'done', message })}
            onDiscard={() => close(false)}
          />
        )}
        {stage.step === 'done' && (
          <Flex direction="column" gap="3">
            <Text role="status">{stage.message}</Text>
            <Flex gap="2">
              <Button onClick={() => setStage({ step: 'choose' })}>Upload another file</Button>
              <Dialog.Close>
                <Button variant="soft" color="gray">
                  Close
                </Button>
              </Dialog.Close>
            </Flex>
          </Flex>
        )}
      </Dialog.Content>
    </Dialog.Root>
  );
}
