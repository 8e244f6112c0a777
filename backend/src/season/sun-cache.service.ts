import { Injectable } from '@nestjs/common';
import { SunCache } from '@thermbay/engine/season/sun-hours';

/** One sun cache for the whole process: every season run at a site-year after the first skips the astronomy. */
@Injectable()
export class SunCacheService {
  readonly cache = new SunCache();
}
