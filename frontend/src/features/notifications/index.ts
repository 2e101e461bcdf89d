// The notifications feature's public face for other features.
export { DocSetNotificationsCard } from './components/doc-set-notifications-card.js';
