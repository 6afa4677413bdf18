import { TextLink } from '../components/ui/text-link';

export function NotFoundPage() {
  return (
    <section className="max-w-prose space-y-4">
      <title>Page not found · Tracewright</title>
      <h1 className="text-3xl font-bold">Page not found</h1>
      <p>There is no page at this address. It may have moved, or the link was cut short.</p>
      <p>
        <TextLink to="/">Go to the home page</TextLink>
      </p>
    </section>
  );
}
