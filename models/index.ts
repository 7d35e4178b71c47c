import type { Sequelize } from 'sequelize';
import { MailMessage } from './mail-message';
import { PasswordToken } from './password-token';
import { SignInThrottle } from './sign-in-throttle';
import { SiteSettings } from './site-settings';
import { User } from './user';

export { MailMessage, PasswordToken, SignInThrottle, SiteSettings, User };

const initialised = new WeakSet<Sequelize>();

export function initModels(sequelize: Sequelize): void {
  if (initialised.has(sequelize)) return;
  for (const model of [User, SiteSettings, PasswordToken, SignInThrottle, MailMessage]) model.initModel(sequelize);
  PasswordToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  initialised.add(sequelize);
}
