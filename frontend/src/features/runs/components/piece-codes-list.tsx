import type { RunDetail } from '@tracewright/shared';

export function PieceCodesList({ pieces }: { pieces: RunDetail['pieces'] }) {
  return (
    <section aria-labelledby="pieces-title">
      <h2 id="pieces-title" className="mb-1 text-lg font-bold">
        Pieces ({pieces.length})
      </h2>
      <ol className="grid grid-cols-2 gap-x-4 font-mono text-sm sm:grid-cols-4 print:grid-cols-4">
        {pieces.map((piece) => (
          <li key={piece.id}>{piece.code}</li>
        ))}
      </ol>
    </section>
  );
}
