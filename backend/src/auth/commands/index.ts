import { SignUpHandler } from './sign-up.handler';

export const AUTH_COMMAND_HANDLERS = [SignUpHandler];
