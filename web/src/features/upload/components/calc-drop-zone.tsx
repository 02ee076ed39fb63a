import { Button, makeStyles, mergeClasses, shorthands, Text, tokens } from '@fluentui/react-components';
import { DocumentArrowUpRegular } from '@fluentui/react-icons';
import { useId, useRef, useState, type DragEvent } from 'react';

const useStyles = makeStyles({
  zone: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'center',
    gap: tokens.spacingVerticalS,
    padding: `${tokens.spacingVerticalXXL} ${tokens.spacingHorizontalL}`,
    ...shorthands.border(tokens.strokeWidthThick, 'dashed', tokens.colorNeutralStroke1),
    borderRadius: tokens.borderRadiusXLarge,
    backgroundColor: tokens.colorNeutralBackground1,
    textAlign: 'center',
  },
  active: {
    ...shorthands.borderColor(tokens.colorBrandStroke1),
    backgroundColor: tokens.colorBrandBackground2,
  },
  icon: { fontSize: '36px', color: tokens.colorBrandForeground1 },
  input: { display: 'none' },
});

export interface CalcDropZoneProps {
  readonly onFiles: (files: File[]) => void;
  readonly disabled?: boolean;
}

/** Drop calc files here, or choose them with the button (the keyboard path). */
export function CalcDropZone({ onFiles, disabled = false }: CalcDropZoneProps) {
  const styles = useStyles();
  const inputRef = useRef<HTMLInputElement>(null);
  const [active, setActive] = useState(false);
  const hintId = useId();

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setActive(false);
    if (disabled) return;
    const files = Array.from(event.dataTransfer.files);
    if (files.length > 0) onFiles(files);
  };

  return (
    <div
      className={mergeClasses(styles.zone, active && styles.active)}
      onDragOver={(event) => {
        event.preventDefault();
        if (!disabled) setActive(true);
      }}
      onDragLeave={() => setActive(false)}
      onDrop={onDrop}
      data-testid="calc-drop-zone"
    >
      <DocumentArrowUpRegular className={styles.icon} aria-hidden />
      <Text weight="semibold" size={400}>
        Drop calc files here
      </Text>
      <Text id={hintId}>
        Ligament calc files (.json). Each one is checked in your browser before anything is sent.
      </Text>
      <Button
        appearance="primary"
        disabled={disabled}
        aria-describedby={hintId}
        onClick={() => inputRef.current?.click()}
      >
        Choose files…
      </Button>
      <input
        ref={inputRef}
        className={styles.input}
        type="file"
        multiple
        accept=".json,application/json"
        aria-label="Calc files"
        data-testid="calc-file-input"
        onChange={(event) => {
          const files = Array.from(event.target.files ?? []);
          event.target.value = '';
          if (files.length > 0) onFiles(files);
        }}
      />
    </div>
  );
}
