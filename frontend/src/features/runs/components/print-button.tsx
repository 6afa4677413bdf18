import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';

/** Opens the browser's print dialogue; waits while a QR code is still being drawn. */
type PrintButtonProps = { label?: string; isWaiting?: boolean; variant?: 'primary' | 'secondary' };

export function PrintButton({ label = 'Print', isWaiting = false, variant = 'primary' }: PrintButtonProps) {
  return (
    <Button variant={variant} onClick={() => window.print()} isPending={isWaiting} pendingLabel="Preparing QR codes…">
      <Icon name="printer" />
      {label}
    </Button>
  );
}
