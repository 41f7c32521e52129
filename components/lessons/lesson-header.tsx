'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useRequiredText } from '@/components/ui/required-text';
import type { AppLesson } from '@/lib/data/lessons';

/** The Lesson's title and description, editable by its editors, with the workspace and revision. */
export function LessonHeader({ lesson, canEdit, onSave }: { lesson: AppLesson; canEdit: boolean; onSave: (title: string, description: string) => Promise<boolean> }) {
  const [title, setTitle] = useState(lesson.title);
  const [description, setDescription] = useState(lesson.description);
  const titleCheck = useRequiredText({ id: 'lesson-title', label: 'Lesson title', value: title, max: 200 });
  const dirty = title !== lesson.title || description !== lesson.description;
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="flex min-w-0 flex-1 flex-col gap-1">
        <label htmlFor="lesson-title" className="text-xs font-medium text-ink-soft">
          Lesson title
        </label>
        <input id="lesson-title" value={title} readOnly={!canEdit} maxLength={200} onChange={(e) => setTitle(e.target.value)} {...titleCheck.inputProps} className={`w-full max-w-2xl rounded-md border bg-white px-3 py-2 text-lg font-semibold ${titleCheck.error ? 'border-fail' : 'border-line'}`} />
        {titleCheck.message}
        <label htmlFor="lesson-description" className="sr-only">
          Description
        </label>
        <input
          id="lesson-description"
          value={description}
          readOnly={!canEdit}
          maxLength={4000}
          placeholder="What the class will learn"
          onChange={(e) => setDescription(e.target.value)}
          className="w-full max-w-2xl rounded-md border border-line bg-white px-3 py-1.5 text-sm"
        />
        <p className="text-xs text-ink-faint">
          {lesson.workspaceName} · revision <span className="num">{lesson.revision}</span> · {canEdit ? 'you can edit' : 'read only (viewer)'}
        </p>
      </div>
      {canEdit ? (
        <Button variant="secondary" disabled={!dirty || !title.trim()} onClick={() => void onSave(title, description)}>
          Save title
        </Button>
      ) : null}
    </div>
  );
}
