import { TextLink } from '../../../components/ui/text-link';

type CountLinkProps = { to: string; count: number; one: string; many: string };

/** "3 runs on hold" as a link to the list that shows them; a count of nothing is said plainly. */
export function CountLink({ to, count, one, many }: CountLinkProps) {
  const words = `${count} ${count === 1 ? one : many}`;
  if (count === 0) return <span className="text-graphite-700">{words}</span>;
  return <TextLink to={to}>{words}</TextLink>;
}
