import type { Sequelize } from 'sequelize';
import { User } from './user.js';
import { ShopSettings } from './shop-settings.js';
import { BakeDay } from './bake-day.js';
import { PickupWindow } from './pickup-window.js';
import { MenuItem } from './menu-item.js';
import { BakeDayBox } from './bake-day-box.js';
import { BakeDayMenuItem } from './bake-day-menu-item.js';
import { Order } from './order.js';
import { OrderBox } from './order-box.js';
import { OrderLine } from './order-line.js';
import { PaymentEvent } from './payment-event.js';
import { Refund } from './refund.js';
import { WaitlistEntry } from './waitlist-entry.js';
import { OutboxMessage, type StoredAttachment } from './outbox-message.js';
import { AuditEntry } from './audit-entry.js';
import { FormulaVersion } from './formula-version.js';
import { ProductionSettings } from './production-settings.js';

export type { StoredAttachment };
export {
  User, ShopSettings, BakeDay, PickupWindow, MenuItem, BakeDayBox, BakeDayMenuItem, Order, OrderBox, OrderLine,
  PaymentEvent, Refund, WaitlistEntry, OutboxMessage, AuditEntry, FormulaVersion, ProductionSettings,
};

export function initModels(sequelize: Sequelize) {
  for (const model of [
    User, ShopSettings, BakeDay, PickupWindow, MenuItem, BakeDayBox, BakeDayMenuItem, Order, OrderBox, OrderLine,
    PaymentEvent, Refund, WaitlistEntry, OutboxMessage, AuditEntry, FormulaVersion, ProductionSettings,
  ]) {
    model.initModel(sequelize);
  }
  BakeDay.hasMany(PickupWindow, { as: 'pickupWindows', foreignKey: 'bakeDayId' });
  BakeDay.hasMany(BakeDayBox, { as: 'boxes', foreignKey: 'bakeDayId' });
  BakeDay.belongsToMany(MenuItem, { through: BakeDayMenuItem, as: 'menuItems', foreignKey: 'bakeDayId', otherKey: 'menuItemId' });
  Order.hasMany(OrderBox, { as: 'boxes', foreignKey: 'orderId' });
  OrderBox.hasMany(OrderLine, { as: 'lines', foreignKey: 'orderBoxId' });
  Order.belongsTo(PickupWindow, { as: 'pickupWindow', foreignKey: 'pickupWindowId' });
  Order.belongsTo(BakeDay, { as: 'bakeDay', foreignKey: 'bakeDayId' });
  Order.belongsTo(User, { as: 'user', foreignKey: 'userId' });
}
