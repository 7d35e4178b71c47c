// Empty on purpose. Built inside the project tree, Turbopack would otherwise take the app's own
// instrumentation.ts (and with it Sequelize and the scheduler) from the workspace root.
export function register() {}
