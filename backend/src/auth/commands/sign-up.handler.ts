import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/mariadb';
import { HttpStatus } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { ApiException, ErrorCode, fieldError } from '../../common/errors/api-errors';
import { hashPassword } from '../../users/passwords/password-hasher';
import { passwordProblem } from '../../users/passwords/password-policy';
import { User } from '../../users/user.entity';
import { SignUpCommand } from './sign-up.command';

function emailTaken(): ApiException {
  const message = 'An account with this e-mail address already exists. Sign in, or reset the password.';
  return new ApiException(HttpStatus.CONFLICT, message, ErrorCode.emailTaken, { email: [message] });
}

@CommandHandler(SignUpCommand)
export class SignUpHandler implements ICommandHandler<SignUpCommand> {
  constructor(private readonly em: EntityManager) {}

  async execute({ email, password, displayName }: SignUpCommand): Promise<User> {
    const problem = passwordProblem(password, { email });
    if (problem) throw fieldError('password', problem);
    if (await this.em.count(User, { email })) throw emailTaken();
    const user = this.em.create(User, { email, displayName, passwordHash: await hashPassword(password) });
    try {
      await this.em.flush();
    } catch (e) {
      // Two sign-ups racing for one address: the unique index decides.
      if (e instanceof UniqueConstraintViolationException) {
        this.em.clear();
        throw emailTaken();
      }
      throw e;
    }
    return user;
  }
}
