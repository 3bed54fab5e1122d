import { AlertDialog, Button, Flex, type ButtonProps } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** Props of a button that asks first. */
export interface ConfirmButtonProps {
  /** The button's text, e.g. "Revoke". */
  label: string;
  /** Accessible name when the label alone is ambiguous in a table, e.g. "Revoke render farm". */
  ariaLabel?: string;
  title: string;
  description: ReactNode;
  /** The confirming button's text, e.g. "Revoke the token". */
  confirm: string;
  onConfirm: () => void;
  color?: ButtonProps['color'];
  disabled?: boolean;
  loading?: boolean;
}

/** A button whose action takes effect only after a confirming second press in a dialog. */
export function ConfirmButton({
  label,
  ariaLabel,
  title,
  description,
  confirm,
  onConfirm,
  color = 'red',
  disabled,
  loading,
}: ConfirmButtonProps) {
  return (
    <AlertDialog.Root>
      <AlertDialog.Trigger>
        <Button
          size="1"
          variant="soft"
          color={color}
          disabled={disabled}
          loading={loading}
          aria-label={ariaLabel}
        >
          {label}
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Content maxWidth="440px">
        <AlertDialog.Title>{title}</AlertDialog.Title>
        <AlertDialog.Description size="2">{description}</AlertDialog.Description>
        <Flex gap="3" mt="4" justify="end">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray">
              Keep it
            </Button>
          </AlertDialog.Cancel>
          <AlertDialog.Action>
            <Button color={color} onClick={onConfirm}>
              {confirm}
            </Button>
          </AlertDialog.Action>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
