import { TextLink } from '../../../components/ui/text-link';
import { HomeSection } from './home-section';

export type Place = { to: string; label: string; what: string };

/** Every page the person may open, with a line on what it is for (the navigation's own list). */
export function PlacesList({ places }: { places: readonly Place[] }) {
  return (
    <HomeSection title="Where to find things">
      <ul className="space-y-2">
        {places.map((place) => (
          <li key={place.to}>
            <TextLink to={place.to}>{place.label}</TextLink>: {place.what}
          </li>
        ))}
      </ul>
    </HomeSection>
  );
}
