import { signUp } from '@/app/lib/account-service';
import { parseJsonBody } from '@/app/lib/api';
import { appOrigin } from '@/app/lib/app-origin';
import { serviceResponse } from '@/app/lib/service-response';
import { signUpSchema } from '@/lib/account-forms';

/** POST: create an account (open to anyone) with its personal workspace. */
export async function POST(request: Request) {
  const parsed = await parseJsonBody(request, signUpSchema);
  if (!parsed.ok) return parsed.response;
  const result = await signUp(parsed.data, appOrigin(request));
  return serviceResponse(result, 201);
}
