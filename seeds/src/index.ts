export { seedDemo, demoAccounts, demoMenu, demoBoxes, DEMO_SHOP, DEMO_TIME_ZONE } from './demo.js';
