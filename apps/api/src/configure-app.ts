import { type INestApplication, ValidationPipe } from '@nestjs/common';
import { DocumentBuilder, type OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import { DomainErrorFilter } from './common/domain-error.filter.js';
import { fieldProblems, ValidationFailedError } from './common/validation-failed.error.js';

/** Everything main.ts and the tests share: prefix, validation, errors, cookies, OpenAPI. */
export function configureApp(app: INestApplication): OpenAPIObject {
  app.setGlobalPrefix('api');
  app.use(cookieParser());
  app.useGlobalPipes(
    new ValidationPipe({
      whitelist: true,
      forbidNonWhitelisted: true,
      transform: true,
      exceptionFactory: (errors) => new ValidationFailedError(fieldProblems(errors)),
    }),
  );
  app.useGlobalFilters(new DomainErrorFilter());
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Tressury API')
      .setDescription('Back office for multi-location hair salons. Money and quantities are decimal strings.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .addCookieAuth('tressury_refresh')
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
  return document;
}
