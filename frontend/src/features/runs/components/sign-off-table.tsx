const BOX = 'h-10 w-32 border border-graphite-900';

/** Empty boxes the operator fills in by hand: time and initials when a step starts and ends. */
export function SignOffTable({ caption, rows = ['Started', 'Done'] }: { caption: string; rows?: string[] }) {
  return (
    <table className="self-start border-collapse text-sm">
      <caption className="sr-only">{caption}</caption>
      <thead>
        <tr>
          <td />
          <th scope="col" className="px-2 text-left font-bold">Time</th>
          <th scope="col" className="px-2 text-left font-bold">Initials</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row}>
            <th scope="row" className="pr-3 text-left font-bold">{row}</th>
            <td className={BOX} />
            <td className={BOX} />
          </tr>
        ))}
      </tbody>
    </table>
  );
}
