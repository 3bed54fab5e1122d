import { Button, Flex, Text } from '@radix-ui/themes';
import { useId } from 'react';
import { useDropzone, type FileRejection } from 'react-dropzone';
import type { AssetKind } from '../api/library-types';
import './library.css';

/** File extensions each kind accepts (the API refuses the rest). */
export const KIND_EXTENSIONS: Record<AssetKind, readonly string[]> = {
  character: ['.glb'],
  capture: ['.glb'],
  clip: ['.bvh', '.glb'],
};

/** Why a dropped file is not even sent, in words; null when its type fits the kind. */
export function checkFileType(kind: AssetKind, fileName: string): string | null {
  const allowed = KIND_EXTENSIONS[kind];
  const lower = fileName.toLowerCase();
  if (allowed.some((ext) => lower.endsWith(ext))) return null;
  return `${fileName} is not a ${allowed.join(' or ')} file, which a ${kind} must be.`;
}

/** Props of the drop area. */
export interface UploadDropZoneProps {
  kind: AssetKind;
  disabled?: boolean;
  onFiles: (files: File[]) => void;
  onRejected: (messages: string[]) => void;
}

/** Drop files here or choose them: only files of the kind's type get through. */
export function UploadDropZone({ kind, disabled, onFiles, onRejected }: UploadDropZoneProps) {
  const hintId = useId();
  const extensions = KIND_EXTENSIONS[kind];
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    disabled,
    noClick: true,
    noKeyboard: true,
    validator: (file) => {
      const problem = checkFileType(kind, file.name);
      return problem ? { code: 'file-invalid-type', message: problem } : null;
    },
    onDrop: (accepted: File[], rejected: FileRejection[]) => {
      if (accepted.length > 0) onFiles(accepted);
      onRejected(rejected.flatMap((r) => r.errors.map((e) => e.message)));
    },
  });
  return (
    <div
      {...getRootProps({ className: 'drop-area' })}
      data-dragging={isDragActive}
      data-disabled={disabled ? 'true' : 'false'}
      data-testid="drop-area"
    >
      <input
        {...getInputProps({
          accept: extensions.join(','),
          'aria-label': `${kind} files to upload`,
        })}
      />
      <Flex direction="column" align="center" gap="2">
        <Text id={hintId} size="2" align="center">
          {isDragActive
            ? 'Drop to upload'
            : `Drop ${extensions.join(' or ')} files here to upload them as ${kind}s`}
        </Text>
        <Button
          type="button"
          variant="soft"
          onClick={open}
          disabled={disabled}
          aria-describedby={hintId}
        >
          Choose files…
        </Button>
      </Flex>
    </div>
  );
}
