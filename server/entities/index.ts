import { AuditLog } from './AuditLog';
import { LibraryEntry } from './LibraryEntry';
import { MailMessage } from './MailMessage';
import { PasswordReset } from './PasswordReset';
import { RefreshToken } from './RefreshToken';
import { Submission } from './Submission';
import { User } from './User';

export { AuditLog, LibraryEntry, MailMessage, PasswordReset, RefreshToken, Submission, User };
export const ENTITIES = [User, LibraryEntry, RefreshToken, PasswordReset, Submission, AuditLog, MailMessage];
