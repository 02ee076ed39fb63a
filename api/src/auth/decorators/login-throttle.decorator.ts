import { SetMetadata } from '@nestjs/common';

export const LOGIN_THROTTLE = 'ligament:login-throttle';
/** Counts the route against the stricter `login` throttler. */
export const LoginThrottle = () => SetMetadata(LOGIN_THROTTLE, true);
