import 'server-only';
import { buyerShopProfiles } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { shopSupplySchema } from '@/lib/validation/shop-supply';

/** Buyers and dealers keep their own shop's supply; it is always their own row. */
export const saveShopSupply = defineOperation({
  name: 'buyer.shop-supply.save',
  entityType: 'user',
  access: 'report.buy',
  input: shopSupplySchema,
  async run({ actor, input, tx }) {
    const values = { supplyVoltage: input.supplyVoltage, supplyPhases: input.supplyPhases };
    await tx
      .insert(buyerShopProfiles)
      .values({ userId: actor!.id, ...values })
      .onDuplicateKeyUpdate({ set: values });
    return { data: values, entityId: actor!.id };
  },
});
