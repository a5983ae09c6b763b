import { PageHeader } from '@/components/ui/page-header';
import { RequireArea } from '@/features/auth/components/require-area';
import { ProductLinesOverview } from '@/features/product-lines/components/product-lines-overview';

export default function ProductLinesRoute() {
  return (
    <>
      <title>Product lines · Polecourt</title>
      <PageHeader title="Product lines" lead="Product families, their requirement sets and the revisions of each set." />
      <RequireArea area="product_lines">{(access) => <ProductLinesOverview access={access} />}</RequireArea>
    </>
  );
}
