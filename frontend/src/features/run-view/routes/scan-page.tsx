import { useState } from 'react';
import { useNavigate } from 'react-router';

import { FormError } from '../../../components/ui/form-error';
import { isApiError } from '../../../lib/api-error';
import { findRunByCode } from '../api/find-run-by-code';
import { QrScanner } from '../components/qr-scanner';
import { RunCodeForm } from '../components/run-code-form';
import { scanTarget } from '../utils/scan-target';

/** /run/scan — point the camera at a traveller's QR code (or type its code) to open the run. */
export function ScanPage() {
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string | null>(null);
  const [attempt, setAttempt] = useState(0);
  const [isBusy, setIsBusy] = useState(false);

  const refuse = (message: string) => {
    setProblem(message);
    setAttempt((n) => n + 1);
  };

  const open = async (text: string) => {
    const target = scanTarget(text, window.location.origin);
    if (target.type === 'path') return void navigate(target.path);
    if (target.type === 'unknown') return refuse(`“${target.text}” is not a run of this lab. Scan the code on the traveller, or type the run code.`);
    setIsBusy(true);
    try {
      const id = await findRunByCode(target.code);
      if (id === null) return refuse(`No run has the code ${target.code}. Check the traveller.`);
      void navigate(`/run/${id}`);
    } catch (error) {
      refuse(isApiError(error) ? error.message : 'The run could not be looked up. Try again.');
    } finally {
      setIsBusy(false);
    }
  };

  return (
    <main className="mx-auto flex min-h-dvh max-w-3xl flex-col gap-6 bg-paper p-4 text-[1.25rem] text-graphite-900">
      <h1 className="text-[2.25rem] font-bold">Open a run</h1>
      <p>Point the camera at the QR code on the run’s traveller.</p>
      <QrScanner key={attempt} label="Camera picture for the traveller code" onResult={(text) => void open(text)} />
      <FormError message={problem ?? undefined} />
      <RunCodeForm onSubmit={(code) => void open(code)} isBusy={isBusy} />
    </main>
  );
}
