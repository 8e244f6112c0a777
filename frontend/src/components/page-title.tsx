/**
 * The document title of a page, "<page> – Thermbay", so that every page (and browser tab, and
 * screen-reader announcement on navigation) says where the user is. React moves <title> into
 * the document head.
 */
export function PageTitle({ title }: { title: string }) {
  return <title>{`${title} – Thermbay`}</title>;
}
