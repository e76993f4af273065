export { seedDemo, demoAccounts, demoMenu, demoBoxes, DEMO_SHOP, DEMO_TIME_ZONE } from './demo.js';
export { seedCounterDay, removeCounterDay, counterDayOrders, type CounterDayOrder, type SeededCounterDay } from './counter-day.js';
