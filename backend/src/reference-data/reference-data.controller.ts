import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { ReferenceData } from '@thermbay/engine/reference-data.types';
import { ReferenceDataService } from './reference-data.service';

@ApiTags('reference-data')
@ApiBearerAuth()
@Controller('reference-data')
export class ReferenceDataController {
  constructor(private readonly reference: ReferenceDataService) {}

  @Get()
  @ApiOkResponse({
    description:
      'Every handbook table by name: { title, description, rows: [{ id, label, source, confidence, ...values }] }',
    schema: {
      type: 'object',
      additionalProperties: {
        type: 'object',
        required: ['title', 'rows'],
        properties: {
          title: { type: 'string' },
          description: { type: 'string' },
          rows: {
            type: 'array',
            items: {
              type: 'object',
              required: ['id', 'source', 'confidence'],
              properties: {
                id: { type: 'string' },
                label: { type: 'string' },
                source: { type: 'string' },
                confidence: {
                  type: 'string',
                  enum: ['verified', 'verified-secondary', 'derived', 'memory', 'common-practice'],
                },
                notes: { type: 'string' },
              },
              additionalProperties: true,
            },
          },
        },
      },
    },
  })
  all(): ReferenceData {
    return this.reference.data;
  }
}
