import { useSuspenseQuery } from '@tanstack/react-query';

import type { Printer } from '@tracewright/shared';

import { TextLink } from '../../../components/ui/text-link';
import { recordsQueryOptions } from '../api/get-records';
import { DetailSection } from './detail-section';

const HEAD = 'bg-graphite-100 px-3 py-2 text-left font-bold';
const CELL = 'border-t border-graphite-200 px-3 py-2';

/** Which ink sits in which channel, each ink linked to its page. */
export function PrinterChannels({ printer }: { printer: Printer }) {
  const { data: inks } = useSuspenseQuery(recordsQueryOptions('inks'));
  const nameOf = new Map(inks.map((ink) => [ink.id, ink.name]));
  return (
    <DetailSection title="Channels">
      <table className="w-full max-w-xl border-collapse rounded-md border border-graphite-300">
        <caption className="sr-only">Channels of {printer.name} and the ink loaded in each.</caption>
        <thead>
          <tr>
            <th scope="col" className={HEAD}>Channel</th>
            <th scope="col" className={HEAD}>Ink loaded</th>
          </tr>
        </thead>
        <tbody>
          {printer.channels.map((channel) => (
            <tr key={channel.name}>
              <th scope="row" className={`${CELL} text-left font-bold`}>
                {channel.name}
              </th>
              <td className={CELL}>
                {channel.inkId === null ? (
                  <span className="text-graphite-700">Empty</span>
                ) : (
                  <TextLink to={`/materials/inks/${channel.inkId}`}>{nameOf.get(channel.inkId) ?? `Ink ${channel.inkId}`}</TextLink>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </DetailSection>
  );
}
