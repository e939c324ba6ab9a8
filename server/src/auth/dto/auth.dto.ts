import { Transform } from 'class-transformer';
import { IsEmail, IsNotEmpty, IsOptional, IsString, MaxLength } from 'class-validator';

const trimLower = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value);

export class SignInDto {
  @Transform(trimLower)
  @IsEmail({}, { message: 'Enter your school e-mail address.' })
  @MaxLength(254)
  email: string;

  @IsString() @IsNotEmpty({ message: 'Enter your password.' }) @MaxLength(1024)
  password: string;
}

export class PasswordResetRequestDto {
  @Transform(trimLower)
  @IsEmail({}, { message: 'Enter your school e-mail address.' })
  @MaxLength(254)
  email: string;
}

export class SetPasswordDto {
  @IsString() @IsNotEmpty({ message: 'The link is incomplete.' }) @MaxLength(200)
  token: string;

  @IsString() @IsNotEmpty({ message: 'Choose a password.' }) @MaxLength(1024)
  password: string;

  @IsOptional() @IsString() @IsNotEmpty() @MaxLength(120)
  displayName?: string;
}
