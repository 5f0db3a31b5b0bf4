// Turns a story's file recipe into bytes: the recipe says what the file shows, the context adds
// the project, the day and the person, as the real document would carry them.
import type { Actor } from '../../shared/requests/types';
import { demoAgency, demoProjects, type DemoProjectKey } from './demoCast';
import { letterDocument, sealDataSheet, sitePhoto, submittalSketch, type DemoFile } from './demoFiles';
import type { FileRecipe } from './storyTypes';

export type FileContext = { project: DemoProjectKey; date: string; preparedBy: Actor };

export function makeDemoFile(recipe: FileRecipe, ctx: FileContext): Promise<DemoFile> {
  const project = demoProjects[ctx.project];
  switch (recipe.make) {
    case 'sketch': {
      const { make: _make, ...spec } = recipe;
      return submittalSketch({
        ...spec,
        agency: demoAgency,
        projectName: `${project.name} (contract ${project.contractNumber})`,
        structureNumber: project.structureNumber,
        preparedBy: `${ctx.preparedBy.name}, ${ctx.preparedBy.organization ?? ''}`.replace(/, $/, ''),
        date: ctx.date,
        spansFt: project.spansFt,
      });
    }
    case 'dataSheet': {
      const { make: _make, ...spec } = recipe;
      return sealDataSheet(spec);
    }
    case 'letter': {
      const { make: _make, ...spec } = recipe;
      return letterDocument({ ...spec, date: ctx.date });
    }
    case 'photo': {
      const { make: _make, ...spec } = recipe;
      return sitePhoto(spec);
    }
  }
}
