import { Transform } from 'class-transformer';

/** Query strings carry "true"/"false" as text; anything else is left for @IsBoolean to refuse. */
export const BooleanQuery = () => Transform(({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value));
