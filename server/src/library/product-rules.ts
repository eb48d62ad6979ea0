import type { ContainerInput, FieldProblem, ProductInput } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { decimalsMessage, fitsCurrency } from '../billing/money';
import { badRequest } from '../http/problem';

/**
 * A product of kind lime is caustic whichever boxes were ticked: picking the kind says so, and the
 * alkali and eye-protection caution is raised by the flag alone. Set, never refused.
 */
export function withLimeFlag(product: ProductInput): ProductInput {
  if (product.kind !== 'lime' || product.hazards.isLime) return product;
  return { ...product, hazards: { ...product.hazards, isLime: true } };
}

/**
 * Container prices are money in the firm's currency: "4500.50" in a yen firm would be rounded away in
 * every price made from it (400 naming `containers.N.price`). The firm's row is share-locked, so a
 * currency change waits for this save and then checks the prices it stored (firms/currency-change.ts).
 */
export async function checkContainerPrices(tx: TenantTx, containers: readonly ContainerInput[]): Promise<void> {
  const { rows } = await tx.client.query<{ currency: string }>(`select currency from firms where id = $1 for share`, [tx.tenantId]);
  const currency = rows[0].currency;
  const problems: FieldProblem[] = containers.flatMap((c, i) =>
    fitsCurrency(c.price, currency) ? [] : [{ field: `containers.${i}.price`, message: decimalsMessage(currency) }],
  );
  if (problems.length) throw badRequest(problems);
}
