import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module.js';
import { KitchensModule } from '../kitchens/kitchens.module.js';
import { LabelsController } from './labels.controller.js';
import { LabelsRepository } from './labels.repository.js';
import { LabelsService } from './labels.service.js';

/** Printable jar labels with QR codes, and the public jar record those codes open. */
@Module({
  imports: [AuthModule, KitchensModule],
  controllers: [LabelsController],
  providers: [LabelsService, LabelsRepository],
})
export class LabelsModule {}
