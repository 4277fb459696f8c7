import { Command } from '@nestjs/cqrs';
import type { User } from '../../users/user.entity';

/** Create an account (the password already checked against the policy) and return it. */
export class SignUpCommand extends Command<User> {
  constructor(
    readonly email: string,
    readonly password: string,
    readonly displayName: string,
  ) {
    super();
  }
}
