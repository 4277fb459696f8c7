import { Command } from '@nestjs/cqrs';

/**
 * Create an account for a free address; for a taken one, tell its owner by e-mail. The caller answers the
 * same either way (no account enumeration), so the command returns nothing.
 */
export class SignUpCommand extends Command<void> {
  constructor(
    readonly email: string,
    readonly password: string,
    readonly displayName: string,
  ) {
    super();
  }
}
