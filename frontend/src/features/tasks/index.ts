// The tasks feature's public face for other features.
export { CreateTasksDialog, type TaskRequest } from './components/create-tasks-dialog.js';
export { MyOpenTasks } from './components/my-open-tasks.js';
export { PageTasksPanel } from './components/page-tasks-panel.js';
