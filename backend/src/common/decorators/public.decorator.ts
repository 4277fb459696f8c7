import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'shoalbook:public';

/** The route answers without a session (the session guard still loads one when present). */
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC_KEY, true);
