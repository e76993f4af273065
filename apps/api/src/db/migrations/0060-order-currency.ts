import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// Each order keeps the currency it was priced and charged in (ISO 4217, lower
// case as the payments service writes it): the shop may change its currency
// later, and the order's amounts, its payment check and its refunds stay in
// the one it was paid in. A new order takes the shop's currency of the moment
// it is written (a trigger, so every way of writing an order does).
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE FUNCTION shop_currency() RETURNS text LANGUAGE sql STABLE AS $$
      SELECT COALESCE((SELECT lower(currency) FROM shop_settings ORDER BY id LIMIT 1), 'usd')
    $$;
    ALTER TABLE orders ADD COLUMN currency text CHECK (currency ~ '^[a-z]{3}$');
    UPDATE orders SET currency = shop_currency();
    ALTER TABLE orders ALTER COLUMN currency SET NOT NULL;
    CREATE FUNCTION orders_take_shop_currency() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF NEW.currency IS NULL THEN NEW.currency := shop_currency(); END IF;
      RETURN NEW;
    END $$;
    CREATE TRIGGER orders_currency BEFORE INSERT ON orders FOR EACH ROW EXECUTE FUNCTION orders_take_shop_currency();
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TRIGGER IF EXISTS orders_currency ON orders;
    DROP FUNCTION IF EXISTS orders_take_shop_currency();
    DROP FUNCTION IF EXISTS shop_currency();
    ALTER TABLE orders DROP COLUMN IF EXISTS currency;
  `);
};
