import { Global, Module, type DynamicModule } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { AppConfig } from './app-config';
import { envValidationSchema } from './env.validation';

@Global()
@Module({})
export class AppConfigModule {
  /**
   * Reads and validates the environment when the app is built, not when this file is imported,
   * so every app instance (tests build several) sees the environment of its own moment.
   */
  static forRoot(): DynamicModule {
    return {
      module: AppConfigModule,
      imports: [
        ConfigModule.forRoot({
          // Settings come from the environment only: npm start and npm test set them.
          ignoreEnvFile: true,
          validationSchema: envValidationSchema,
          validationOptions: { abortEarly: false },
        }),
      ],
      providers: [AppConfig],
      exports: [AppConfig],
    };
  }
}
